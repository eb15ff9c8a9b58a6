import type { TimelineEvent } from "@/lib/press/timeline";

const MARK: Record<TimelineEvent["kind"], string> = {
  created: "bg-steel-400",
  installed: "bg-ok",
  removed: "bg-steel-500",
  replaced: "bg-oil-500",
  hours: "bg-steel-300",
};

export function PressTimeline({ events }: { events: TimelineEvent[] }) {
  return (
    <ol className="relative ml-2 border-l border-steel-200" data-testid="press-timeline">
      {events.map((e, i) => (
        <li key={`${e.on}-${i}`} className="mb-3 ml-4">
          <span className={`absolute -left-1.5 mt-1.5 h-3 w-3 rounded-full ${MARK[e.kind]}`} aria-hidden="true" />
          <p className="text-sm">
            <time className="font-mono text-xs text-steel-500">{e.on}</time> {e.title}
          </p>
          {e.detail ? <p className="text-xs text-steel-600">{e.detail}</p> : null}
        </li>
      ))}
    </ol>
  );
}
