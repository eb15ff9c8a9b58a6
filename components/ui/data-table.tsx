"use client";

import { flexRender, type Table } from "@tanstack/react-table";

type Props<T> = { table: Table<T>; minWidth: string; testId?: string; cellClass?: string; empty?: string };

/** Renders a TanStack table: sortable headers as buttons with aria-sort, rows and an empty message. */
export function DataTable<T>({ table, minWidth, testId, cellClass = "px-3 py-2", empty }: Props<T>) {
  const rows = table.getRowModel().rows;
  return (
    <>
      <table className="w-full text-left text-sm" style={{ minWidth }} data-testid={testId}>
        <thead className="border-b border-steel-200 text-xs uppercase tracking-wide text-steel-500">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                const label = flexRender(h.column.columnDef.header, h.getContext());
                return (
                  <th key={h.id} className="px-2 py-2" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined}>
                    {h.column.getCanSort() ? (
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase">
                        {label}
                        <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} className="border-b border-steel-100 align-top last:border-0">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={cellClass}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {rows.length === 0 && empty ? <p className="p-4 text-sm text-steel-600">{empty}</p> : null}
    </>
  );
}
