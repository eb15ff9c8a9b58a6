import type { Metadata } from "next";
import { Button } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { requireShopContext } from "@/lib/auth/current";
import { ChangePasswordForm } from "./_components/change-password-form";
import { updateUnitsAction } from "./actions";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const { user } = await requireShopContext();
  return (
    <>
      <PageTitle title="Account" subtitle={`${user.displayName} · ${user.email}`} />
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title="Password">
          <ChangePasswordForm />
        </Card>
        <Card title="Units">
          <form action={updateUnitsAction} className="flex flex-col gap-3">
            <fieldset className="flex flex-col gap-2">
              <legend className="mb-1 text-sm text-steel-600">Show quantities in</legend>
              {(["metric", "imperial"] as const).map((system) => (
                <label key={system} className="flex min-h-10 items-center gap-2 text-sm">
                  <input type="radio" name="unitSystem" value={system} defaultChecked={user.unitSystem === system} />
                  {system === "metric" ? "Metric (mm, bar, L/min, kN)" : "Imperial (in, psi, US gpm, US tons)"}
                </label>
              ))}
            </fieldset>
            <Button type="submit" variant="secondary" className="self-start">
              Save units
            </Button>
          </form>
        </Card>
      </div>
    </>
  );
}
