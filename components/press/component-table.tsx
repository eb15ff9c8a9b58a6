"use client";

import { createColumnHelper, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { DataTable } from "@/components/ui/data-table";
import { FilterSelect } from "@/components/ui/filter-select";
import type { ComponentRow } from "@/lib/data/components";
import { fetchJson } from "@/lib/fetch-json";
import { KIND_LABELS } from "@/lib/press/component-fields";
import { formatMoney } from "@/lib/press/parts-list";
import { specSummary } from "@/lib/press/spec-summary";
import type { UnitSystem } from "@/lib/units";
import { ScrollRegion } from "@/components/ui/scroll-region";

/** What the table shows of a part: the page passes only these fields, once (the rows render here). */
export type PartRow = Pick<ComponentRow, "id" | "kind" | "label" | "spec" | "costCents" | "installedOn">;

type Props = { pressId: string; initial: PartRow[]; units: UnitSystem; currency: string; canEdit: boolean };

const col = createColumnHelper<PartRow>();

/** The installed parts: sortable by kind, name or cost, filterable by kind; kept fresh from the JSON API. */
export function ComponentTable({ pressId, initial, units, currency, canEdit }: Props) {
  const { data, error } = useSWR<{ components: PartRow[] }>(`/api/presses/${pressId}/components`, fetchJson, { fallbackData: { components: initial } });
  const [sorting, setSorting] = useState<SortingState>([{ id: "kind", desc: false }]);
  const [kind, setKind] = useState("all");
  const parts = useMemo(() => (data?.components ?? []).filter((c) => kind === "all" || c.kind === kind), [data, kind]);
  const kindsPresent = useMemo(() => [...new Set((data?.components ?? []).map((c) => c.kind))], [data]);

  const columns = useMemo(
    () => [
      col.accessor("kind", { header: "Kind", cell: (c) => KIND_LABELS[c.getValue()], sortingFn: (a, b) => KIND_LABELS[a.original.kind].localeCompare(KIND_LABELS[b.original.kind]) }),
      col.accessor("label", {
        header: "Part",
        cell: (c) => (
          <div className="min-w-0">
            <p className="font-medium">{c.getValue()}</p>
            <p className="text-xs text-steel-600">{specSummary(c.row.original.spec, units)}</p>
          </div>
        ),
      }),
      col.accessor("costCents", { header: "Cost", cell: (c) => formatMoney(c.getValue(), currency), sortUndefined: "last" }),
      col.accessor("installedOn", { header: "Installed", cell: (c) => c.getValue() ?? "—" }),
      col.display({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) =>
          canEdit ? (
            <div className="flex gap-1 text-sm">
              {(["edit", "replace", "remove"] as const).map((action) => (
                <Link key={action} className="rounded px-1.5 py-1 capitalize text-oil-700 underline" href={`/presses/${pressId}/components/${c.row.original.id}/${action}`} aria-label={`${action[0]!.toUpperCase()}${action.slice(1)} ${c.row.original.label}`}>
                  {action}
                </Link>
              ))}
            </div>
          ) : null,
      }),
    ],
    [units, currency, canEdit, pressId],
  );

  // The table library's hook returns functions the React Compiler cannot memoise safely; this component opts out.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({ data: parts, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel(), getFilteredRowModel: getFilteredRowModel() });

  if ((data?.components ?? []).length === 0) return <p className="text-sm text-steel-600">No parts recorded yet.</p>;
  return (
    <div className="flex flex-col gap-3">
      <FilterSelect value={kind} onChange={setKind} allLabel="All parts" options={kindsPresent.map((k) => ({ value: k, label: KIND_LABELS[k] }))} />
      {error ? <p className="text-sm text-fail">Could not refresh the parts: {(error as Error).message}</p> : null}
      <ScrollRegion label="Parts">
        <DataTable table={table} minWidth="40rem" testId="component-list" cellClass="px-2 py-2" />
      </ScrollRegion>
    </div>
  );
}
