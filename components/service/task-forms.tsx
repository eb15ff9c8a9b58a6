"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";
import { SERVICE_KIND_OPTIONS } from "./kind-options";

type Action = (state: ActionState, form: FormData) => Promise<ActionState>;

export function StartingPlanButton({ action }: { action: Action }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-2">
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Button type="submit" disabled={pending}>
        Use the starting plan
      </Button>
    </form>
  );
}

type TaskValues = { title: string; kind: string; intervalDays: string; intervalHours: string };

function TaskFields({ state, initial, idPrefix }: { state: ActionState; initial: TaskValues; idPrefix: string }) {
  const v = state.ok ? initial : { ...initial, ...state.values };
  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4 [&>*]:min-w-0 [&_select]:w-full [&_select]:min-w-0">
      <Field id={`${idPrefix}-title`} name="title" label="Task" maxLength={100} required defaultValue={v.title} errors={state.fieldErrors?.title} />
      <SelectField id={`${idPrefix}-kind`} name="kind" label="Completed by a log entry of" options={SERVICE_KIND_OPTIONS} defaultValue={v.kind} errors={state.fieldErrors?.kind} />
      <Field id={`${idPrefix}-days`} name="intervalDays" label="Every … days" inputMode="numeric" defaultValue={v.intervalDays} errors={state.fieldErrors?.intervalDays} />
      <Field id={`${idPrefix}-hours`} name="intervalHours" label="or every … hours" inputMode="decimal" defaultValue={v.intervalHours} errors={state.fieldErrors?.intervalHours} />
    </div>
  );
}

export function AddTaskForm({ action }: { action: Action }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-3" noValidate key={state.ok ? state.message : "add"}>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <TaskFields state={state} idPrefix="new-task" initial={{ title: "", kind: "filter-changed", intervalDays: "", intervalHours: "" }} />
      <div>
        <Button type="submit" variant="secondary" disabled={pending}>
          Add task
        </Button>
      </div>
    </form>
  );
}

export function EditTaskForm({ action, task }: { action: Action; task: { id: string } & TaskValues }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-3" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <TaskFields state={state} idPrefix={`task-${task.id}`} initial={task} />
      <div className="flex gap-2">
        <Button type="submit" name="intent" value="save" variant="secondary" disabled={pending}>
          Save
        </Button>
        <Button type="submit" name="intent" value="delete" variant="quiet" disabled={pending}>
          Remove from plan
        </Button>
      </div>
    </form>
  );
}
