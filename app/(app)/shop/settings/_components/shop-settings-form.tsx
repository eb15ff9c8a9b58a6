"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState } from "@/lib/action-state";
import { updateShopAction } from "../actions";

export function ShopSettingsForm({ name, timeZone, zones }: { name: string; timeZone: string; zones: string[] }) {
  const [state, action, pending] = useActionState(updateShopAction, initialActionState);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Field name="name" label="Shop name" required maxLength={100} defaultValue={state.values?.name ?? name} errors={state.fieldErrors?.name} />
      <SelectField
        name="timeZone"
        label="Time zone"
        options={zones.map((z) => ({ value: z, label: z }))}
        defaultValue={state.values?.timeZone ?? timeZone}
        errors={state.fieldErrors?.timeZone}
      />
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : "Save settings"}
      </Button>
    </form>
  );
}
