"use client";

import { createColumnHelper, flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import type { ComponentRow } from "@/lib/data/components";
import { fetchJson } from "@/lib/fetch-json";
import { KIND_LABELS } from "@/lib/press/component-fields";
import { formatMoney } from "@/lib/press/parts-list";
import { specSummary } from "@/lib/press/spec-summary";
import type { UnitSystem } from "@/lib/units";

type Props = { pressId: string; initial: ComponentRow[]; units: UnitSystem; currency: string; canEdit: boolean };

const col = createColumnHelper<ComponentRow>();

/** The installed parts: sortable by kind, name or cost, filterable by kind; kept fresh from the JSON API. */
export function ComponentTable({ pressId, initial, units, currency, canEdit }: Props) {
  const { data, error } = useSWR<{ components: ComponentRow[] }>(`/api/presses/${pressId}/components`, fetchJson, { fallbackData: { components: initial } });
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
      <label className="flex max-w-xs flex-col gap-1 text-sm">
        <span className="font-medium text-steel-800">Show</span>
        <select value={kind} onChange={(e) => setKind(e.target.value)} className="min-h-11 rounded-md border border-steel-300 bg-white px-3">
          <option value="all">All parts</option>
          {kindsPresent.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </label>
      {error ? <p className="text-sm text-fail">Could not refresh the parts: {(error as Error).message}</p> : null}
      <div className="overflow-x-auto">
        <table className="w-full min-w-[40rem] text-left text-sm" data-testid="component-list">
          <thead className="border-b border-steel-200 text-xs uppercase tracking-wide text-steel-500">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} className="px-2 py-2" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined}>
                      {h.column.getCanSort() ? (
                        <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase">
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-steel-100 align-top last:border-0">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-2 py-2">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
