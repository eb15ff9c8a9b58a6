"use client";

import {
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { DataTable } from "@/components/ui/data-table";
import { showQuantity } from "@/components/ui/quantity";
import { StatusBadge } from "@/components/ui/status-badge";
import type { PressWithStatus } from "@/lib/data/press-status";
import { STATUS_CODES } from "@/lib/status";
import { fetchJson } from "@/lib/fetch-json";
import { FRAME_TYPE_LABELS, LIFECYCLE_LABELS } from "@/lib/press-labels";
import type { UnitSystem } from "@/lib/units";
import { ScrollRegion } from "@/components/ui/scroll-region";

const col = createColumnHelper<PressWithStatus>();

/** Sortable, filterable list of the shop's presses, kept fresh from /api/presses. */
export function PressTable({ initial, units }: { initial: PressWithStatus[]; units: UnitSystem }) {
  const { data, error } = useSWR<{ presses: PressWithStatus[] }>("/api/presses", fetchJson, { fallbackData: { presses: initial } });
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [query, setQuery] = useState("");
  const [lifecycle, setLifecycle] = useState("active");

  const rows = useMemo(() => {
    const presses = data?.presses ?? [];
    return lifecycle === "all" ? presses : lifecycle === "active" ? presses.filter((p) => p.lifecycle !== "retired") : presses.filter((p) => p.lifecycle === lifecycle);
  }, [data, lifecycle]);

  const columns = useMemo(
    () => [
      col.accessor("name", { header: "Name", cell: (c) => <Link href={`/presses/${c.row.original.id}`} className="font-semibold text-ink underline decoration-steel-300 underline-offset-2">{c.getValue()}</Link> }),
      col.accessor((p) => p.status.code, {
        id: "status",
        header: "Status",
        cell: (c) => <StatusBadge status={c.row.original.status} />,
        // Most serious first when sorted ascending.
        sortingFn: (a, b) => STATUS_CODES.indexOf(a.original.status.code) - STATUS_CODES.indexOf(b.original.status.code),
      }),
      col.accessor("frameType", { header: "Frame", cell: (c) => FRAME_TYPE_LABELS[c.getValue()] }),
      col.accessor("lifecycle", { header: "Lifecycle", cell: (c) => LIFECYCLE_LABELS[c.getValue()] }),
      col.accessor("ratedForceKn", { header: "Rated", cell: (c) => showQuantity("force", c.getValue(), units), sortUndefined: "last" }),
      col.accessor("strokeMm", { header: "Stroke", cell: (c) => showQuantity("length", c.getValue(), units) }),
      col.accessor("reliefPressureBar", { header: "Relief", cell: (c) => showQuantity("pressure", c.getValue(), units) }),
      col.accessor("hourMeter", { header: "Hours", cell: (c) => `${c.getValue()} h` }),
      col.accessor("location", { header: "Location", cell: (c) => c.getValue() ?? "—" }),
    ],
    [units],
  );

  // The table library's hook returns functions the React Compiler cannot memoise safely; this component opts out.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: query },
    onSortingChange: setSorting,
    onGlobalFilterChange: setQuery,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap gap-3">
        <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm">
          <span className="font-medium text-steel-800">Search</span>
          <input value={query} onChange={(e) => setQuery(e.target.value)} placeholder="Name, frame, location…" className="min-h-11 rounded-md border border-steel-300 bg-white px-3" />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium text-steel-800">Show</span>
          <select value={lifecycle} onChange={(e) => setLifecycle(e.target.value)} className="min-h-11 rounded-md border border-steel-300 bg-white px-3">
            <option value="active">All but retired</option>
            <option value="all">All</option>
            {Object.entries(LIFECYCLE_LABELS).map(([v, l]) => (
              <option key={v} value={v}>
                {l}
              </option>
            ))}
          </select>
        </label>
      </div>
      {error ? <p className="text-sm text-fail">Could not refresh the list: {(error as Error).message}</p> : null}
      <ScrollRegion label="Presses" className="rounded-lg bg-white ring-1 ring-steel-200">
        <DataTable table={table} minWidth="44rem" testId="press-table" cellClass="px-3 py-2 font-mono first:font-sans" empty="No presses match." />
      </ScrollRegion>
    </div>
  );
}
