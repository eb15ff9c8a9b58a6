/**
 * Benchmark: median time of one full evaluateSizing call with every optional block.
 * Run with `npx tsx scripts/bench-sizing.ts`. Target < 0.1 ms. Prints figures; asserts nothing.
 */
import { performance } from "node:perf_hooks";
import { evaluateSizing } from "@/lib/hydraulics";
import { FULL_SIZING_INPUT } from "../tests/fixtures/sizing-inputs";

const FULL_INPUT = FULL_SIZING_INPUT;

const WARM_UP = 20_000;
const SAMPLES = 200;
const CALLS_PER_SAMPLE = 500; // one call is too short for the timer; time a batch and divide

function median(sorted: number[]): number {
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? (sorted[mid] ?? 0) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
}

// Keeps the optimiser from discarding calls whose result is unused.
let sink = 0;
for (let i = 0; i < WARM_UP; i++) sink += evaluateSizing(FULL_INPUT).checks.length;

const perCallMs: number[] = [];
for (let s = 0; s < SAMPLES; s++) {
  const start = performance.now();
  for (let i = 0; i < CALLS_PER_SAMPLE; i++) sink += evaluateSizing(FULL_INPUT).checks.length;
  perCallMs.push((performance.now() - start) / CALLS_PER_SAMPLE);
}
perCallMs.sort((a, b) => a - b);

const med = median(perCallMs);
const p95 = perCallMs[Math.floor(perCallMs.length * 0.95)] ?? Number.NaN;
const fmt = (ms: number): string => `${(ms * 1000).toFixed(1)} µs`;
console.log(`evaluateSizing, every optional block (${SAMPLES} samples × ${CALLS_PER_SAMPLE} calls, after ${WARM_UP} warm-up calls)`);
console.log(`  median ${fmt(med)}   p95 ${fmt(p95)}   min ${fmt(perCallMs[0] ?? Number.NaN)}`);
console.log(`  target < 100 µs: ${med < 0.1 ? "met" : "NOT met"}   (checks per call: ${sink / (WARM_UP + SAMPLES * CALLS_PER_SAMPLE)})`);
