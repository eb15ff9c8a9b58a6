"use client";

import Link from "next/link";
import { useActionState } from "react";
import { savePlannedPressAction } from "@/app/(public)/sizing/actions";
import { Button, buttonClass } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState } from "@/lib/action-state";
import type { SizingInput } from "@/lib/hydraulics/types";
import { FRAME_TYPE_LABELS } from "@/lib/press-labels";
import type { UnitSystem } from "@/lib/units";
import { gaugeCardHref, sizingHref } from "./links";

export interface SaveContext {
  signedIn: boolean;
  /** The user's role in their working shop lets them add presses. */
  canSave: boolean;
  shopName: string | null;
}

interface Props {
  name: string;
  onNameChange: (name: string) => void;
  /** The current input when it is valid; saving and the gauge card need one. */
  input: SizingInput | null;
  system: UnitSystem;
  context: SaveContext;
}

const FRAME_TYPES = Object.keys(FRAME_TYPE_LABELS) as (keyof typeof FRAME_TYPE_LABELS)[];

/** Names the press, links its gauge card and — for a shop manager — saves it as a planned press. */
export function SavePlan({ name, onNameChange, input, system, context }: Props) {
  const [state, action, pending] = useActionState(savePlannedPressAction, initialActionState);
  const gaugeHref = input
    ? gaugeCardHref({ boreMm: input.cylinders.boreMm, count: input.cylinders.count, reliefBar: input.reliefBar ?? input.pressureBar, units: system, name })
    : null;

  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <FormMessage message={state.message} />
      <Field
        name="name"
        label="Press name"
        maxLength={100}
        value={name}
        onChange={(e) => onNameChange(e.target.value)}
        hint="Printed on the gauge card and used when you save."
        errors={state.fieldErrors?.name}
      />
      {context.canSave ? (
        <div className="flex flex-col gap-1">
          <label htmlFor="save-frameType" className="text-sm font-medium text-steel-800">
            Frame type
          </label>
          <select
            id="save-frameType"
            name="frameType"
            defaultValue={state.values?.frameType ?? "h-frame"}
            className="min-h-11 rounded-md border border-steel-300 bg-white px-3 text-base"
          >
            {FRAME_TYPES.map((t) => (
              <option key={t} value={t}>
                {FRAME_TYPE_LABELS[t]}
              </option>
            ))}
          </select>
          {state.fieldErrors?.frameType ? <p className="text-sm text-fail">{state.fieldErrors.frameType.join(" ")}</p> : null}
        </div>
      ) : null}
      <input type="hidden" name="sizingInput" value={input ? JSON.stringify(input) : ""} />
      {state.fieldErrors?.sizingInput ? <FormMessage message={state.fieldErrors.sizingInput.join(" ")} /> : null}
      <div className="flex flex-wrap gap-2">
        {gaugeHref ? (
          <Link href={gaugeHref} className={buttonClass("secondary")}>
            Open the gauge card
          </Link>
        ) : null}
        {context.canSave ? (
          <Button type="submit" disabled={pending || !input}>
            {pending ? "Saving…" : "Save as a planned press"}
          </Button>
        ) : null}
      </div>
      {!input ? <p className="text-sm text-steel-600">Fix the marked inputs to open the gauge card or save.</p> : null}
      {context.canSave && context.shopName ? (
        <p className="text-xs text-steel-600">Saved to {context.shopName}; it appears on the dashboard as a planned press.</p>
      ) : null}
      {context.signedIn && !context.canSave ? (
        <p className="text-sm text-steel-700">
          Only a manager of {context.shopName ?? "this shop"} can add presses to it. Switch to a shop you manage to save this plan.
        </p>
      ) : null}
      {!context.signedIn ? (
        <p className="text-sm text-steel-700">
          <Link href={`/sign-in?next=${encodeURIComponent(sizingHref(input, name))}`} className="font-semibold text-oil-700 underline">
            Sign in
          </Link>{" "}
          to save this as a planned press; these inputs come back with you. No account yet?{" "}
          <Link href="/sign-up" className="font-semibold text-oil-700 underline">
            Create one free
          </Link>
          .
        </p>
      ) : null}
    </form>
  );
}
