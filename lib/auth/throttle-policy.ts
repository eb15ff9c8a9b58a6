/** How many failed sign-ins are free, and how the wait grows after that (per account and per IP). */
export const LIMITS = {
  account: { free: 10, baseWaitS: 30, maxWaitS: 60 * 60 },
  ip: { free: 50, baseWaitS: 60, maxWaitS: 60 * 60 },
} as const;

export type Scope = keyof typeof LIMITS;
export type Subject = { scope: Scope; subject: string };

export function waitAfter(scope: Scope, failures: number): number {
  const { free, baseWaitS, maxWaitS } = LIMITS[scope];
  if (failures < free) return 0;
  return Math.min(maxWaitS, baseWaitS * 2 ** (failures - free));
}


/** A wait in words for a refusal message: "45 seconds", "3 minutes". */
export function formatWait(seconds: number): string {
  return seconds < 90 ? `${seconds} seconds` : `${Math.ceil(seconds / 60)} minutes`;
}
