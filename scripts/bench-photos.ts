/**
 * Benchmark: median time of processPhoto on a 12-megapixel JPEG, and of a bare sharp resize of the
 * same image to 2560 px, with their ratio (target ≤ 1.5). Run with `npm run bench:photos`, i.e.
 * `tsx --conditions=react-server scripts/bench-photos.ts` (the condition makes "server-only" a no-op).
 * Prints figures; asserts nothing.
 */
import { cpus } from "node:os";
import { performance } from "node:perf_hooks";
import sharp from "sharp";
import { FULL_MAX_EDGE, processPhoto } from "@/lib/photos/pipeline";

const WIDTH = 4000;
const HEIGHT = 3000;
const WARM_UP = 2;
const SAMPLES = 15;

/** A gradient with per-pixel noise: compresses and decodes like a real photo, unlike a flat colour. */
async function twelveMegapixelJpeg(): Promise<Buffer> {
  const pixels = Buffer.alloc(WIDTH * HEIGHT * 3);
  let state = 0x9e3779b9;
  for (let i = 0; i < pixels.length; i++) {
    state = (state * 1664525 + 1013904223) >>> 0;
    const x = (i / 3) % WIDTH;
    pixels[i] = (x / WIDTH) * 190 + (state >>> 26);
  }
  return sharp(pixels, { raw: { width: WIDTH, height: HEIGHT, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

async function time(run: () => Promise<unknown>): Promise<number[]> {
  for (let i = 0; i < WARM_UP; i++) await run();
  const samples: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    const start = performance.now();
    await run();
    samples.push(performance.now() - start);
  }
  return samples;
}

const input = await twelveMegapixelJpeg();
let outputBytes = 0;
// Interleaved rounds, so drift in machine load affects both measurements alike.
const pipelineMs: number[] = [];
const bareMs: number[] = [];
for (let round = 0; round < 3; round++) {
  pipelineMs.push(...(await time(async () => {
    const { full, thumb } = await processPhoto(input);
    outputBytes = full.bytes + thumb.bytes;
  })));
  bareMs.push(...(await time(() => sharp(input).resize({ width: FULL_MAX_EDGE, height: FULL_MAX_EDGE, fit: "inside" }).toBuffer())));
}

const pipeline = median(pipelineMs);
const bare = median(bareMs);
console.log(`12 MP JPEG (${WIDTH} × ${HEIGHT}, ${(input.length / 1e6).toFixed(1)} MB), ${pipelineMs.length} samples each, ${cpus().length} CPUs, libvips threads ${sharp.concurrency()}`);
console.log(`  processPhoto (full ${FULL_MAX_EDGE} px + thumbnail): median ${pipeline.toFixed(1)} ms  → ${(outputBytes / 1e6).toFixed(2)} MB out`);
console.log(`  bare sharp resize to ${FULL_MAX_EDGE} px:               median ${bare.toFixed(1)} ms`);
console.log(`  ratio ${(pipeline / bare).toFixed(2)}  (target ≤ 1.5: ${pipeline / bare <= 1.5 ? "met" : "NOT met"})`);
