"use client";

import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import useSWRInfinite from "swr/infinite";
import { DataTable } from "@/components/ui/data-table";
import { FilterSelect } from "@/components/ui/filter-select";
import type { ServiceEntry, ServiceLogPage } from "@/lib/data/service-log";
import { fetchJson } from "@/lib/fetch-json";
import { formatMoney } from "@/lib/press/parts-list";
import { SERVICE_KIND_LABELS } from "@/lib/service/starting-plan";
import { formatQuantity, type UnitSystem } from "@/lib/units";
import { SERVICE_KIND_OPTIONS } from "./kind-options";
import { ScrollRegion } from "@/components/ui/scroll-region";

export type ServiceLogRow = Omit<ServiceEntry, "createdAt">;
type Page = { entries: ServiceLogRow[]; nextCursor: string | null };
type Props = { pressId: string; initial: Page; units: UnitSystem; currency: string; pageSize: number };

const col = createColumnHelper<ServiceLogRow>();

function detail(e: ServiceLogRow, units: UnitSystem): string {
  const bits: string[] = [];
  if (e.componentLabel) bits.push(e.componentLabel);
  if (e.iso4406) bits.push(`ISO 4406 ${e.iso4406}`);
  const bar = (v: number) => formatQuantity("pressure", v, units);
  if (e.reliefFoundBar !== null) bits.push(`found ${bar(e.reliefFoundBar)}`);
  if (e.reliefSetBar !== null) bits.push(`set ${bar(e.reliefSetBar)}`);
  if (e.parts.length) bits.push(e.parts.map((p) => `${p.quantity} × ${p.description}`).join(", "));
  return bits.join(" · ");
}

/**
 * The service log: pages of 25 read newest first from the JSON API (keyset cursor, "Show older"),
 * filtered by kind on the server and sorted in the browser within what is loaded.
 */
export function ServiceLogTable({ pressId, initial, units, currency, pageSize }: Props) {
  const [kind, setKind] = useState("all");
  const [sorting, setSorting] = useState<SortingState>([]);
  const base = `/api/presses/${pressId}/service-log?limit=${pageSize}${kind === "all" ? "" : `&kind=${kind}`}`;
  const { data, error, size, setSize, isValidating } = useSWRInfinite<Page>(
    (index, previous: Page | null) => (index === 0 ? base : previous?.nextCursor ? `${base}&cursor=${previous.nextCursor}` : null),
    fetchJson<ServiceLogPage> as (url: string) => Promise<Page>,
    { fallbackData: kind === "all" ? [initial] : undefined, revalidateFirstPage: false },
  );
  const entries = useMemo(() => (data ?? []).flatMap((p) => p.entries), [data]);
  const more = data?.at(-1)?.nextCursor != null;

  const columns = useMemo(
    () => [
      col.accessor("performedOn", { header: "Date", cell: (c) => <Link className="whitespace-nowrap font-mono underline" href={`/presses/${pressId}/service/${c.row.original.id}`}>{c.getValue()}</Link> }),
      col.accessor("kind", { header: "Work", cell: (c) => SERVICE_KIND_LABELS[c.getValue()], sortingFn: (a, b) => SERVICE_KIND_LABELS[a.original.kind].localeCompare(SERVICE_KIND_LABELS[b.original.kind]) }),
      col.accessor("hours", { header: "Hours", cell: (c) => (c.getValue() === null ? "—" : `${c.getValue()} h`), sortUndefined: "last" }),
      col.display({ id: "detail", header: "Details", cell: (c) => <span className="text-steel-700">{detail(c.row.original, units) || "—"}{c.row.original.notes ? <span className="block text-xs text-steel-500">{c.row.original.notes}</span> : null}</span> }),
      col.accessor("costCents", { header: "Cost", cell: (c) => formatMoney(c.getValue(), currency), sortUndefined: "last" }),
      col.accessor("performedByName", { header: "By", cell: (c) => <>{c.getValue() ?? "—"}{c.row.original.corrected ? <span className="block text-xs text-steel-500">corrected</span> : null}</> }),
    ],
    [pressId, units, currency],
  );
  // The table library's hook returns functions the React Compiler cannot memoise safely; this component opts out.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({ data: entries, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <FilterSelect value={kind} onChange={setKind} allLabel="All work" options={SERVICE_KIND_OPTIONS} />
        <a className="text-sm text-oil-700 underline" href={`/api/presses/${pressId}/service-log?format=csv`} download>
          Download the log (CSV)
        </a>
      </div>
      {error ? <p className="text-sm text-fail">Could not load the log: {(error as Error).message}</p> : null}
      <ScrollRegion label="Service log">
        <DataTable table={table} minWidth="48rem" testId="service-log" cellClass="px-2 py-2" empty={isValidating && !data ? "Loading…" : "Nothing logged yet."} />
      </ScrollRegion>
      {more ? (
        <button type="button" className="self-start text-sm text-oil-700 underline" onClick={() => void setSize(size + 1)} disabled={isValidating}>
          Show older entries
        </button>
      ) : null}
    </div>
  );
}
