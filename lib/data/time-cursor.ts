/** Keyset cursor of a newest-first list ordered by a time and then the id: `{ms, 13 digits}_{id}`. */
export const TIME_CURSOR_PATTERN = /^(\d{13})_([a-z2-7]{24})$/;

export function encodeTimeCursor(at: Date, id: string): string {
  return `${at.getTime().toString().padStart(13, "0")}_${id}`;
}

/** The cursor's time and id; null for no cursor or one that is not a cursor. */
export function parseTimeCursor(cursor: string | undefined): { at: Date; id: string } | null {
  const match = cursor ? TIME_CURSOR_PATTERN.exec(cursor) : null;
  return match ? { at: new Date(Number(match[1])), id: match[2]! } : null;
}
