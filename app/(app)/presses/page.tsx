import type { Metadata } from "next";
import { PressCard } from "@/components/press/press-card";
import { Card, PageTitle } from "@/components/ui/card";
import { requireShopContext } from "@/lib/auth/current";
import { listPresses } from "@/lib/data/presses";

export const metadata: Metadata = { title: "Presses" };

export default async function PressesPage() {
  const { user, shop } = await requireShopContext();
  const presses = await listPresses({ userId: user.id }, shop.id);
  return (
    <>
      <PageTitle title="Presses" subtitle={`Every press of ${shop.name}.`} />
      {presses.length === 0 ? (
        <Card>
          <p className="text-sm text-steel-600">No presses yet.</p>
        </Card>
      ) : (
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {presses.map((press) => (
            <PressCard key={press.id} press={press} units={user.unitSystem} />
          ))}
        </div>
      )}
    </>
  );
}
