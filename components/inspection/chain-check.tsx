"use client";

import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { fetchJson } from "@/lib/fetch-json";
import type { ChainProblem } from "@/lib/inspections/chain";
import { formatWhen } from "./inspection-record";

export type ChainResult = { checked: number; intact: boolean; brokenCount: number; broken: ChainProblem[]; checkedAt: string };

const REASONS = { content: "its content changed", link: "its link to the record before changed", sequence: "a record before it is missing" } as const;

/**
 * Whether the press's signed inspections still match their chain: the server's latest check comes
 * with the page (lib/data/chain-status.ts); "Check now" recomputes the whole chain on request.
 */
export function ChainCheck({ pressId, initial, timeZone }: { pressId: string; initial: ChainResult; timeZone: string }) {
  const [chain, setChain] = useState(initial);
  const [state, setState] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });

  async function checkNow() {
    setState({ busy: true, error: null });
    try {
      const report = await fetchJson<Omit<ChainResult, "checkedAt">>(`/api/presses/${pressId}/inspections/verify`);
      setChain({ ...report, checkedAt: new Date().toISOString() });
      setState({ busy: false, error: null });
    } catch (error) {
      setState({ busy: false, error: error instanceof Error ? error.message : "The check could not run." });
    }
  }

  const when = `Checked ${formatWhen(new Date(chain.checkedAt), timeZone)}.`;
  return (
    <div className="flex flex-col gap-2">
      {chain.intact ? (
        <p className="rounded-md bg-ok-soft px-3 py-2 text-sm text-ok ring-1 ring-ok/30" data-testid="chain-status">
          Record intact: {chain.checked === 1 ? "1 signed inspection" : `${chain.checked} signed inspections`} checked against the chain. <span className="text-xs">{when}</span>
        </p>
      ) : (
        <div role="alert" className="rounded-md bg-fail-soft px-3 py-2 text-sm text-fail ring-1 ring-fail/30" data-testid="chain-status">
          <p className="font-semibold">
            Record broken: {chain.brokenCount === 1 ? "1 signed inspection no longer matches" : `${chain.brokenCount} signed inspections no longer match`} its chain.
          </p>
          <ul className="mt-1 list-inside list-disc">
            {chain.broken.map((b) => (
              <li key={b.id}>
                Record no. {b.chainSeq} ({REASONS[b.reason]}) —{" "}
                <a href={`/inspections/${b.id}`} className="underline">
                  open it
                </a>
              </li>
            ))}
          </ul>
          <p className="text-xs">{when}</p>
        </div>
      )}
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <button type="button" className={buttonClass("secondary")} onClick={() => void checkNow()} disabled={state.busy}>
          {state.busy ? "Checking…" : "Check the chain now"}
        </button>
        {state.error ? (
          <span role="alert" className="text-fail">
            {state.error}
          </span>
        ) : null}
      </div>
    </div>
  );
}
