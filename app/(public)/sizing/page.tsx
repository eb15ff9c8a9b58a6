import type { Metadata } from "next";
import { SizingCalculator } from "@/components/sizing/sizing-calculator";
import type { SaveContext } from "@/components/sizing/save-plan";
import { PageTitle } from "@/components/ui/card";
import { getCurrentSession } from "@/lib/auth/current";
import { canEditPress } from "@/lib/auth/permissions";
import { getActiveShop } from "@/lib/data/shops";
import type { SizingInput } from "@/lib/hydraulics/types";
import { sizingInputSchema } from "@/lib/validation/sizing";

export const metadata: Metadata = {
  title: "Sizing",
  description: "Size the cylinders, pump and motor of a hydraulic forging press: force, speeds, power and sourced checks.",
};

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

/** Inputs carried in the link (?input=<SI JSON>&name=…); anything invalid falls back to the defaults. */
function linkedInput(params: Record<string, string | string[] | undefined>): { input: SizingInput; name: string } | null {
  const { input, name } = params;
  if (typeof input !== "string" || input.length > 20_000) return null;
  let json: unknown;
  try {
    json = JSON.parse(input);
  } catch {
    return null;
  }
  const parsed = sizingInputSchema.safeParse(json);
  return parsed.success ? { input: parsed.data, name: typeof name === "string" ? name.slice(0, 100) : "" } : null;
}

export default async function SizingPage({ searchParams }: { searchParams: SearchParams }) {
  const [current, params] = await Promise.all([getCurrentSession(), searchParams]);
  let save: SaveContext = { signedIn: false, canSave: false, shopName: null };
  if (current) {
    const shop = await getActiveShop({ userId: current.user.id }, current.user.activeShopId);
    save = { signedIn: true, canSave: canEditPress(shop?.role ?? null), shopName: shop?.name ?? null };
  }
  return (
    <div className="mx-auto max-w-6xl px-4 py-8">
      <PageTitle
        title="Sizing"
        subtitle="Cylinders, pump and motor before you buy. Results update as you type and are worked out in your browser."
      />
      <SizingCalculator accountSystem={current?.user.unitSystem ?? null} save={save} initial={linkedInput(params)} />
    </div>
  );
}
