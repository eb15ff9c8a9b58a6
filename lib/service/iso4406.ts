/**
 * ISO 4406 cleanliness codes: three scale numbers for particles ≥4, ≥6 and ≥14 µm(c) per mL,
 * written "18/16/13". Each step doubles the count, so a larger particle size can never carry a
 * higher number than a smaller one (hydraulics-reference §7, trap 11). Scale numbers run 0–28 in
 * the standard's table (recalled from memory; ">28" is not accepted here).
 */
export const ISO4406_PATTERN = /^(\d{1,2})\/(\d{1,2})\/(\d{1,2})$/;
export const ISO4406_MAX = 28;

export type Iso4406Check = { ok: true; code: [number, number, number] } | { ok: false; message: string };

export function parseIso4406(text: string): Iso4406Check {
  const m = ISO4406_PATTERN.exec(text.trim());
  if (!m) return { ok: false, message: "Write the code as three numbers, e.g. 18/16/13." };
  const code = [Number(m[1]), Number(m[2]), Number(m[3])] as [number, number, number];
  if (code.some((n) => n > ISO4406_MAX)) return { ok: false, message: `Each scale number is 0–${ISO4406_MAX}.` };
  if (code[1] > code[0] || code[2] > code[1]) {
    return { ok: false, message: "The numbers never increase with particle size (≥4 µm ≥ ≥6 µm ≥ ≥14 µm)." };
  }
  return { ok: true, code };
}
