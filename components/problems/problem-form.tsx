"use client";

import { useActionState } from "react";
import { PhotoUploader } from "@/components/photos/lazy-photo-uploader";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";
import { SEVERITY_OPTIONS } from "@/lib/problem-labels";


/** Any member: what is wrong, how serious, and whether the press must stop being used now. */
export function ProblemForm({ pressId, action: submit }: { pressId: string; action: (prev: ActionState, form: FormData) => Promise<ActionState> }) {
  const [state, action, pending] = useActionState(submit, initialActionState);
  const v = (key: string): string | undefined => (state.ok ? undefined : state.values?.[key]);
  const reported = state.ok ? state.values?.problemId : undefined;
  return (
    <div className="flex flex-col gap-4">
      <form action={action} className="flex flex-col gap-3" noValidate data-testid="problem-form">
        <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
        <div className="flex flex-col gap-1">
          <label htmlFor="problem-description" className="text-sm font-medium text-steel-800">
            What is wrong?
          </label>
          <textarea
            id="problem-description"
            name="description"
            rows={3}
            maxLength={1000}
            required
            defaultValue={v("description")}
            aria-invalid={state.fieldErrors?.description ? true : undefined}
            aria-describedby={state.fieldErrors?.description ? "problem-description-error" : undefined}
            className="rounded-md border border-steel-300 bg-white px-3 py-2 text-base"
          />
          <FieldError id="problem-description-error" errors={state.fieldErrors?.description} />
        </div>
        <SelectField name="severity" label="How serious" options={SEVERITY_OPTIONS} defaultValue={v("severity") ?? "medium"} errors={state.fieldErrors?.severity} id="problem-severity" />
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" name="stopUse" defaultChecked={v("stopUse") === "on"} className="mt-1 h-5 w-5" />
          <span>
            <span className="font-medium">Stop use</span> — tag the press out now and tell the managers. Use this for anything that could hurt someone:
            a leak under pressure, a crack, a valve that does not relieve.
          </span>
        </label>
        <p className="text-xs text-steel-500">Never feel for a leak with your hand: oil under pressure can go through skin. Relieve the pressure first.</p>
        <Button type="submit" disabled={pending} className="self-start">
          {pending ? "Sending…" : "Report problem"}
        </Button>
      </form>
      {reported ? (
        <section aria-label="Photo of the problem" className="rounded-md bg-steel-50 p-3">
          <h3 className="mb-2 text-sm font-semibold">Add a photo of it (optional)</h3>
          <PhotoUploader key={reported} target={{ pressId, problemReportId: reported }} />
        </section>
      ) : null}
    </div>
  );
}
