"use client";

import { useSearchParams } from "next/navigation";
import { Suspense, useMemo } from "react";
import { useSessionView } from "@/components/shell/use-session-view";
import { canEditPress } from "@/lib/auth/permissions";
import { linkedInput, type LinkedSizing } from "./linked-input";
import type { SaveContext } from "./save-plan";
import { SizingCalculator } from "./sizing-calculator";

const SIGNED_OUT: SaveContext = { signedIn: false, canSave: false, shopName: null };

/**
 * The sizing page's calculator. The page is prerendered with the defaults; in the browser the
 * link's inputs (?input=, read through useSearchParams inside Suspense) and the visitor's account
 * (unit system, whether they may save) are filled in. Saving is checked again by the action.
 */
export function VisitorSizingCalculator() {
  return (
    <Suspense fallback={<CalculatorForVisitor linked={null} />}>
      <LinkedCalculator />
    </Suspense>
  );
}

function LinkedCalculator() {
  const params = useSearchParams();
  const linked = useMemo(() => linkedInput(params), [params]);
  return <CalculatorForVisitor linked={linked} />;
}

function CalculatorForVisitor({ linked }: { linked: LinkedSizing | null }) {
  const view = useSessionView();
  const save: SaveContext = view?.signedIn
    ? { signedIn: true, canSave: canEditPress(view.shop?.role ?? null), shopName: view.shop?.name ?? null }
    : SIGNED_OUT;
  return <SizingCalculator accountSystem={view?.signedIn ? view.user.unitSystem : null} save={save} initial={linked} />;
}
