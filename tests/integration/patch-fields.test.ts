// Hardening #3: a PATCH changes only the fields it carries. Every PATCH route is sent each of its
// schema's fields alone, and every other stored column must come back unchanged. The sample
// tables must name every field of each schema, so a field added later is tested too.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { PATCH as patchComponentRoute } from "@/app/api/components/[componentId]/route";
import { PATCH as patchPhotoRoute } from "@/app/api/photos/[photoId]/route";
import { PATCH as patchPressRoute } from "@/app/api/presses/[pressId]/route";
import { db } from "@/db/client";
import { components, photos, presses } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { createComponent } from "@/lib/data/components";
import { createPress } from "@/lib/data/press-edits";
import { newId } from "@/lib/ids";
import { photoPatchFields } from "@/lib/validation/photo";
import { componentInputSchema, componentPatchSchema, pressPatchSchema } from "@/lib/validation/press";
import { jsonRequest, makeUser } from "./helpers";

type U = Awaited<ReturnType<typeof makeUser>>;
let manager: U;
let cookie: { cookie: string };
const params = <K extends string>(key: K, value: string) => ({ params: Promise.resolve({ [key]: value } as Record<K, string>) });
const patch = (path: string, body: unknown) => jsonRequest(path, body, cookie, "PATCH");

/** Columns that legitimately change on every write. */
const BOOKKEEPING = new Set(["updatedAt"]);

function unchangedExcept<T extends Record<string, unknown>>(before: T, after: T, field: string): void {
  for (const key of Object.keys(before)) {
    if (key === field || BOOKKEEPING.has(key)) continue;
    expect(after[key], `${key} changed when only ${field} was sent`).toEqual(before[key]);
  }
}

beforeAll(async () => {
  manager = await makeUser();
  cookie = { cookie: `session=${(await createSession(manager.userId)).token}` };
});

const FULL_PRESS = {
  name: "Full press",
  frameType: "h-frame",
  lifecycle: "in-service",
  ratedForceKn: 500,
  daylightMm: 800,
  strokeMm: 300,
  bedWidthMm: 600,
  bedDepthMm: 400,
  workingPressureBar: 200,
  reliefPressureBar: 220,
  location: "Bay 2",
  notes: "Original notes",
} as const;

const PRESS_SAMPLES: Record<keyof typeof pressPatchSchema.shape, unknown> = {
  name: "Renamed press",
  frameType: "four-post",
  lifecycle: "building",
  ratedForceKn: 450,
  daylightMm: 750,
  strokeMm: 250,
  bedWidthMm: 550,
  bedDepthMm: 350,
  workingPressureBar: 180,
  reliefPressureBar: 210,
  location: "Bay 3",
  notes: "Only the notes change",
};

describe("PATCH /api/presses/{id}", () => {
  it.each(Object.entries(PRESS_SAMPLES))("with only %s changes only that field", async (field, value) => {
    const { id } = await createPress({ userId: manager.userId }, manager.shopId, FULL_PRESS);
    const [before] = await db.select().from(presses).where(eq(presses.id, id));
    const res = await patchPressRoute(patch(`/api/presses/${id}`, { [field]: value }), params("pressId", id));
    expect(res.status).toBe(200);
    const [after] = await db.select().from(presses).where(eq(presses.id, id));
    expect(after![field as keyof typeof after]).toEqual(value);
    unchangedExcept(before!, after!, field);
  });

  it("keeps an in-service press in service when only notes are sent (the reported case)", async () => {
    const { id } = await createPress({ userId: manager.userId }, manager.shopId, FULL_PRESS);
    await patchPressRoute(patch(`/api/presses/${id}`, { notes: "Checked the seals" }), params("pressId", id));
    const [row] = await db.select({ lifecycle: presses.lifecycle }).from(presses).where(eq(presses.id, id));
    expect(row!.lifecycle).toBe("in-service");
  });
});

const COMPONENT_SAMPLES: Record<keyof typeof componentPatchSchema.shape, unknown> = {
  label: "Renamed hose",
  spec: { lengthMm: 1500 },
  maker: "Other maker",
  partNumber: "PN-2",
  supplier: "Other supplier",
  costCents: 4200,
  purchased: false,
  installedOn: "2026-02-02",
};

describe("PATCH /api/components/{id}", () => {
  it.each(Object.entries(COMPONENT_SAMPLES))("with only %s changes only that field", async (field, value) => {
    const { id: pressId } = await createPress({ userId: manager.userId }, manager.shopId, FULL_PRESS);
    const input = componentInputSchema.parse({
      kind: "hose",
      label: "Pressure hose",
      spec: { line: "pressure", insideDiameterMm: 12.7, standard: "SAE 100R2AT", ratedPressureBar: 276, lengthMm: 1000 },
      maker: "Maker",
      partNumber: "PN-1",
      supplier: "Supplier",
      costCents: 1000,
      purchased: true,
      installedOn: "2026-01-10",
    });
    const { id } = await createComponent({ userId: manager.userId }, pressId, input);
    const [before] = await db.select().from(components).where(eq(components.id, id));
    const res = await patchComponentRoute(patch(`/api/components/${id}`, { [field]: value }), params("componentId", id));
    expect(res.status).toBe(200);
    const [after] = await db.select().from(components).where(eq(components.id, id));
    if (field === "spec") {
      // A spec patch merges into the stored spec: only the sent key changes inside it.
      expect(after!.spec).toEqual({ ...before!.spec, lengthMm: 1500 });
    } else {
      expect(after![field as keyof typeof after]).toEqual(value);
    }
    unchangedExcept(before!, after!, field);
  });
});

const PHOTO_SAMPLES: Record<keyof typeof photoPatchFields.shape, unknown> = { caption: "New caption", kind: "leak" };

describe("PATCH /api/photos/{id}", () => {
  it.each(Object.entries(PHOTO_SAMPLES))("with only %s changes only that field", async (field, value) => {
    const { id: pressId } = await createPress({ userId: manager.userId }, manager.shopId, FULL_PRESS);
    const id = newId();
    const file = { fileKey: `k-${id}`, fileUrl: `http://localhost:4010/a/localapp/k-${id}`, width: 800, height: 600, bytes: 1000 };
    await db.insert(photos).values({
      id,
      pressId,
      kind: "weld",
      caption: "Old caption",
      uploadedBy: manager.userId,
      ...file,
      thumbKey: `t-${id}`,
      thumbUrl: `http://localhost:4010/a/localapp/t-${id}`,
      thumbWidth: 400,
      thumbHeight: 300,
      thumbBytes: 500,
    });
    const [before] = await db.select().from(photos).where(eq(photos.id, id));
    const res = await patchPhotoRoute(patch(`/api/photos/${id}`, { [field]: value }), params("photoId", id));
    expect(res.status).toBe(200);
    const [after] = await db.select().from(photos).where(eq(photos.id, id));
    expect(after![field as keyof typeof after]).toEqual(value);
    unchangedExcept(before!, after!, field);
  });
});

describe("PATCH schemas carry no defaults", () => {
  it.each([
    ["press", pressPatchSchema],
    ["component", componentPatchSchema],
    ["photo fields", photoPatchFields],
  ] as const)("the %s PATCH schema parses {} to {}", (_name, schema) => {
    expect(schema.parse({})).toEqual({});
  });
});
