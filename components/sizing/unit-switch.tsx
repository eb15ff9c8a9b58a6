"use client";

import type { UnitSystem } from "@/lib/units";

const OPTIONS: { value: UnitSystem; label: string; hint: string }[] = [
  { value: "metric", label: "Metric", hint: "mm, bar, L/min, kN, kW" },
  { value: "imperial", label: "Imperial", hint: "in, psi, US gpm, US tons, hp" },
];

/** Two radio buttons styled as a segmented switch; keyboard and screen readers see a radio group. */
export function UnitSwitch({ value, onChange }: { value: UnitSystem; onChange: (system: UnitSystem) => void }) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="sr-only">Units</legend>
      <div className="inline-flex rounded-md bg-steel-100 p-1 ring-1 ring-steel-200">
        {OPTIONS.map((option) => (
          <label
            key={option.value}
            title={option.hint}
            className="flex min-h-10 cursor-pointer items-center rounded px-4 text-sm font-semibold text-steel-700 has-checked:bg-white has-checked:text-ink has-checked:shadow-sm has-focus-visible:outline-2 has-focus-visible:outline-oil-500"
          >
            <input
              type="radio"
              name="unit-system"
              value={option.value}
              checked={value === option.value}
              onChange={() => onChange(option.value)}
              className="sr-only"
            />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
