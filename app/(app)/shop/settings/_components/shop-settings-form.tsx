"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState } from "@/lib/action-state";
import { updateShopAction } from "../actions";

export function ShopSettingsForm({ name, timeZone, zones }: { name: string; timeZone: string; zones: string[] }) {
  const [state, action, pending] = useActionState(updateShopAction, initialActionState);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Field name="name" label="Shop name" required maxLength={100} defaultValue={state.values?.name ?? name} errors={state.fieldErrors?.name} />
      <div className="flex flex-col gap-1">
        <label htmlFor="field-timeZone" className="text-sm font-medium text-steel-800">
          Time zone
        </label>
        <select
          id="field-timeZone"
          name="timeZone"
          defaultValue={state.values?.timeZone ?? timeZone}
          className="min-h-11 rounded-md border border-steel-300 bg-white px-3 text-base"
          aria-describedby={state.fieldErrors?.timeZone ? "field-timeZone-error" : undefined}
        >
          {zones.map((z) => (
            <option key={z} value={z}>
              {z}
            </option>
          ))}
        </select>
        {state.fieldErrors?.timeZone ? (
          <p id="field-timeZone-error" className="text-sm text-fail">
            {state.fieldErrors.timeZone.join(" ")}
          </p>
        ) : null}
      </div>
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : "Save settings"}
      </Button>
    </form>
  );
}
