import type { Metadata } from "next";
import { requireShopContext } from "@/lib/auth/current";
import { countPresses } from "@/lib/data/presses";

export const metadata: Metadata = { title: "Floor" };

/**
 * The benchmark's floor page (npm run bench): the signed-in shell (layout, session, shop switcher)
 * plus one indexed query and one line, so every other page's throughput reads as a ratio to it.
 */
export default async function FloorPage() {
  const { user, shop } = await requireShopContext();
  const presses = await countPresses({ userId: user.id }, shop.id);
  return <p>{`${shop.name} has ${presses} ${presses === 1 ? "press" : "presses"}.`}</p>;
}
