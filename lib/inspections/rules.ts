import type { Outcome } from "@/db/schema/inspections";

type Answered = { key: string; text: string; outcome: Outcome | null; note: string | null; photoOnFail: boolean; answerId: string };

/**
 * What still stands between a run and its signature: unanswered items, failures without a note,
 * failures without the photo their item asks for. Empty when it may be signed.
 */
export function signOffProblems(items: readonly Answered[], answersWithPhotos: ReadonlySet<string>): string[] {
  const problems: string[] = [];
  const open = items.filter((i) => !i.outcome);
  if (open.length > 0) problems.push(`${open.length === 1 ? "1 item is" : `${open.length} items are`} not answered yet.`);
  for (const i of items) {
    if (i.outcome !== "fail") continue;
    if (!i.note) problems.push(`“${i.text}” failed without a note.`);
    if (i.photoOnFail && !answersWithPhotos.has(i.answerId)) problems.push(`“${i.text}” failed: add a photo of it.`);
  }
  return problems;
}
