import type { SizingInput } from "@/lib/hydraulics/types";
import { sizingInputSchema } from "@/lib/validation/sizing";

export type LinkedSizing = { input: SizingInput; name: string };

/**
 * The inputs carried in a sizing link (?input=<SI JSON>&name=…, made by sizingHref in ./links);
 * anything invalid gives null, and the calculator starts from its defaults.
 */
export function linkedInput(params: Pick<URLSearchParams, "get">): LinkedSizing | null {
  const input = params.get("input");
  if (input === null || input.length > 20_000) return null;
  let json: unknown;
  try {
    json = JSON.parse(input);
  } catch {
    return null;
  }
  const parsed = sizingInputSchema.safeParse(json);
  return parsed.success ? { input: parsed.data, name: (params.get("name") ?? "").slice(0, 100) } : null;
}
