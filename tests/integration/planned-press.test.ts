import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { memberships, presses } from "@/db/schema";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { listComponents } from "@/lib/data/components";
import { createPlannedPressFromSizing, getPress, listPresses } from "@/lib/data/presses";
import { evaluateAsBuilt } from "@/lib/press/as-built";
import { SizingInputError, type SizingInput } from "@/lib/hydraulics";
import { makeUser } from "./helpers";

type U = Awaited<ReturnType<typeof makeUser>>;
let manager: U;
let member: U;
let outsider: U;

const INPUT: SizingInput = {
  cylinders: { count: 1, boreMm: 125, rodMm: 70, strokeMm: 250 },
  pump: { kind: "two-stage", approachFlowLpm: 40, pressingFlowLpm: 9, unloadBar: 40 },
  pressureBar: 200,
  reliefBar: 210,
  ratings: { hoseBar: 275 },
};

beforeAll(async () => {
  [manager, member, outsider] = await Promise.all([makeUser(), makeUser(), makeUser()]);
  await db.insert(memberships).values({ shopId: manager.shopId, userId: member.userId, role: "member" });
});

describe("createPlannedPressFromSizing", () => {
  it("saves a planned press with the rating at relief and the SI input kept", async () => {
    const { id } = await createPlannedPressFromSizing({ userId: manager.userId }, manager.shopId, {
      name: "  25 t shop press ",
      frameType: "h-frame",
      input: INPUT,
    });
    const press = await getPress({ userId: manager.userId }, id);
    expect(press).toMatchObject({ name: "25 t shop press", lifecycle: "planned", frameType: "h-frame", strokeMm: 250 });
    // 210 bar on a 125 mm bore: 257.71 kN (computed from formula)
    expect(press.ratedForceKn).toBeCloseTo(257.709, 2);
    expect(press.workingPressureBar).toBe(200);
    expect(press.reliefPressureBar).toBe(210);
    const [row] = await db.select({ sizingInput: presses.sizingInput }).from(presses).where(eq(presses.id, id));
    expect(row?.sizingInput).toEqual(INPUT);
    // The sizing's parts became components of the plan, none bought yet, and the as-built check agrees.
    const parts = await listComponents({ userId: manager.userId }, id);
    expect(parts.map((p) => p.kind)).toEqual(expect.arrayContaining(["cylinder", "pump", "relief-valve"]));
    expect(parts.every((p) => !p.purchased)).toBe(true);
    const asBuilt = evaluateAsBuilt(press, parts, "metric");
    expect(asBuilt.ready && asBuilt.result.reliefForceKn).toBeCloseTo(257.709, 2);
    // The dashboard's list shows it too (planned presses included).
    expect((await listPresses({ userId: member.userId }, manager.shopId)).map((p) => p.id)).toContain(id);
  });

  it("uses the working pressure as relief when none is given", async () => {
    const { reliefBar: _dropped, ...noRelief } = INPUT;
    const { id } = await createPlannedPressFromSizing({ userId: manager.userId }, manager.shopId, { name: "No relief", frameType: "c-frame", input: noRelief });
    const press = await getPress({ userId: manager.userId }, id);
    expect(press.reliefPressureBar).toBe(200);
    expect(press.ratedForceKn).toBeCloseTo(245.437, 2); // 200 bar on 125 mm (computed from formula)
  });

  it("refuses a member (ForbiddenError) and anyone outside the shop (NotFoundError)", async () => {
    const plan = { name: "Not mine", frameType: "other" as const, input: INPUT };
    await expect(createPlannedPressFromSizing({ userId: member.userId }, manager.shopId, plan)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(createPlannedPressFromSizing({ userId: outsider.userId }, manager.shopId, plan)).rejects.toBeInstanceOf(NotFoundError);
    const names = (await listPresses({ userId: manager.userId }, manager.shopId)).map((p) => p.name);
    expect(names).not.toContain("Not mine");
  });

  it("refuses input the engine cannot size, even from a caller that skipped the schema", async () => {
    const bad = { ...INPUT, cylinders: { ...INPUT.cylinders, rodMm: 125 } };
    await expect(
      createPlannedPressFromSizing({ userId: manager.userId }, manager.shopId, { name: "Bad", frameType: "h-frame", input: bad }),
    ).rejects.toBeInstanceOf(SizingInputError);
  });
});
