import { Card, PageTitle } from "./card";

/** An honest placeholder for a section whose work is planned but not built yet. */
export function ComingNext({ title, intro, points }: { title: string; intro: string; points: string[] }) {
  return (
    <>
      <PageTitle title={title} subtitle={intro} />
      <Card title="Planned for this page">
        <ul className="list-disc space-y-1 pl-5 text-sm text-steel-700">
          {points.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      </Card>
    </>
  );
}
