import { DueStateBadge, dueText } from "@/components/due/due-list";
import type { ActionState } from "@/lib/action-state";
import type { ServiceTaskView } from "@/lib/data/service-plan";
import { formatLocalDate } from "@/lib/service/format";
import { SERVICE_KIND_LABELS, STARTING_PLAN } from "@/lib/service/starting-plan";
import { AddTaskForm, EditTaskForm, StartingPlanButton } from "./task-forms";

type Action = (state: ActionState, form: FormData) => Promise<ActionState>;
type Props = {
  tasks: ServiceTaskView[];
  timeZone: string;
  canEdit: boolean;
  actions: { startingPlan: Action; addTask: Action; editTask: (taskId: string) => Action };
};

function interval(task: { intervalDays: number | null; intervalHours: number | null }): string {
  return [task.intervalDays ? `${task.intervalDays} days` : null, task.intervalHours ? `${task.intervalHours} h` : null].filter(Boolean).join(" or ") + (task.intervalDays && task.intervalHours ? ", whichever comes first" : "");
}

/** A press's service plan: where each task stands, and for managers the means to adjust it. */
export function ServicePlan({ tasks, timeZone, canEdit, actions }: Props) {
  return (
    <div className="flex flex-col gap-4">
      {tasks.length === 0 ? (
        <div className="flex flex-col gap-3 rounded-md bg-steel-50 p-3 text-sm">
          <p>No service plan yet. A starting plan from common practice for small shop presses:</p>
          <ul className="list-disc pl-5">
            {STARTING_PLAN.map((t) => (
              <li key={t.title}>
                {t.title} — every {interval(t)}
              </li>
            ))}
          </ul>
          <p className="text-xs text-steel-600">Common practice, not a standard: the makers of your pump, filter and oil may ask for shorter intervals. Adjust each task after adding it.</p>
          {canEdit ? <StartingPlanButton action={actions.startingPlan} /> : <p className="text-steel-600">A manager of the shop sets the plan.</p>}
        </div>
      ) : (
        <ul className="divide-y divide-steel-100" data-testid="service-plan">
          {tasks.map((task) => (
            <li key={task.id} className="py-3" data-testid="service-task">
              <div className="flex flex-wrap items-start justify-between gap-2">
                <div className="min-w-0">
                  <p className="font-medium">
                    {task.title}
                    {task.fromStartingPlan ? <span className="ml-2 rounded bg-steel-100 px-1.5 py-0.5 text-xs font-normal text-steel-600">common practice</span> : null}
                  </p>
                  <p className="text-xs text-steel-600">
                    Every {interval(task)} · last {formatLocalDate(task.lastDoneOn)} at {task.lastDoneHours} h · {dueText(task.due, timeZone)} · done by “{SERVICE_KIND_LABELS[task.kind]}”
                  </p>
                </div>
                <DueStateBadge state={task.due.state} />
              </div>
              {canEdit ? (
                <details className="mt-2 text-sm">
                  <summary className="cursor-pointer text-oil-700 underline">Adjust</summary>
                  <div className="mt-2">
                    <EditTaskForm
                      action={actions.editTask(task.id)}
                      task={{ id: task.id, title: task.title, kind: task.kind, intervalDays: task.intervalDays?.toString() ?? "", intervalHours: task.intervalHours?.toString() ?? "" }}
                    />
                  </div>
                </details>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      {canEdit && tasks.length > 0 ? (
        <details className="text-sm">
          <summary className="cursor-pointer font-medium text-oil-700 underline">Add a task</summary>
          <div className="mt-2">
            <AddTaskForm action={actions.addTask} />
          </div>
        </details>
      ) : null}
    </div>
  );
}
