// @vitest-environment jsdom
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { useState } from "react";
import { afterEach, describe, expect, it } from "vitest";
import { DataTable } from "@/components/ui/data-table";

type Row = { name: string; ratedKn: number };
const col = createColumnHelper<Row>();
const columns = [col.accessor("name", { header: "Name" }), col.accessor("ratedKn", { header: "Rated" })];
const ROWS: Row[] = [
  { name: "Bench C-frame", ratedKn: 126 },
  { name: "Four-post 60", ratedKn: 660 },
  { name: "Bay 1 H-frame", ratedKn: 365 },
];

function Harness({ rows }: { rows: Row[] }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({ data: rows, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  return <DataTable table={table} minWidth="10rem" testId="t" empty="Nothing here." />;
}

const names = () => within(screen.getByTestId("t")).getAllByRole("row").slice(1).map((r) => r.firstChild?.textContent);

afterEach(cleanup);

describe("DataTable", () => {
  it("sorts by a column when its header is pressed, and says so with aria-sort", () => {
    render(<Harness rows={ROWS} />);
    expect(names()).toEqual(["Bench C-frame", "Four-post 60", "Bay 1 H-frame"]);
    fireEvent.click(screen.getByRole("button", { name: /Rated/ }));
    expect(names()).toEqual(["Four-post 60", "Bay 1 H-frame", "Bench C-frame"]); // numbers sort descending first
    expect(screen.getByRole("columnheader", { name: /Rated/ }).getAttribute("aria-sort")).toBe("descending");
    fireEvent.click(screen.getByRole("button", { name: /Rated/ }));
    expect(names()).toEqual(["Bench C-frame", "Bay 1 H-frame", "Four-post 60"]);
    fireEvent.click(screen.getByRole("button", { name: /Name/ }));
    expect(names()).toEqual(["Bay 1 H-frame", "Bench C-frame", "Four-post 60"]);
  });

  it("shows the empty message when there are no rows", () => {
    render(<Harness rows={[]} />);
    expect(screen.getByText("Nothing here.")).toBeTruthy();
  });
});
