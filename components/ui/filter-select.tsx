"use client";

/** The "Show …" filter above a table: "all" plus one option per value. */
export function FilterSelect({ value, onChange, allLabel, options }: { value: string; onChange: (value: string) => void; allLabel: string; options: readonly { value: string; label: string }[] }) {
  return (
    <label className="flex max-w-xs flex-col gap-1 text-sm">
      <span className="font-medium text-steel-800">Show</span>
      <select value={value} onChange={(e) => onChange(e.target.value)} className="min-h-11 rounded-md border border-steel-300 bg-white px-3">
        <option value="all">{allLabel}</option>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </label>
  );
}
