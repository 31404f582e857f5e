// What a real camera adds to a clean drawing: sensor grain, darker corners and a colour cast.
// Works on raw pixels in place; the same seed gives the same grain.
import type { Rng } from "../prng";

export type Finish = {
  /** Grain strength, in 8-bit steps (about one standard deviation). */
  grain: number;
  /** How much darker the corners are than the centre, 0–1. */
  vignette: number;
  /** Multipliers per channel: a warm or cool white balance. */
  cast: readonly [number, number, number];
};

const TABLE_BITS = 16;

export function drawFinish(rng: Rng): Finish {
  const warm = rng.real(-0.035, 0.045);
  return { grain: rng.real(3.2, 5.2), vignette: rng.real(0.18, 0.32), cast: [1 + warm, 1 + warm * 0.25, 1 - warm] };
}

/** Applies the finish to 8-bit interleaved pixels (3 or 4 channels; alpha is left alone). */
export function applyFinish(data: Buffer, width: number, height: number, channels: number, finish: Finish, rng: Rng): void {
  // Grain comes from a table of near-normal values read from a random start on every row,
  // so no pattern repeats across the picture.
  const size = 1 << TABLE_BITS,
    mask = size - 1;
  const table = new Float32Array(size);
  for (let i = 0; i < size; i++) table[i] = (rng.next() + rng.next() + rng.next() - 1.5) * 2 * finish.grain;

  const cx = width / 2,
    cy = height / 2,
    reach = cx * cx + cy * cy;
  const colFalloff = new Float32Array(width);
  for (let x = 0; x < width; x++) colFalloff[x] = ((x - cx) * (x - cx)) / reach;
  const [cr, cg, cb] = finish.cast;

  for (let y = 0; y < height; y++) {
    let k = Math.floor(rng.next() * size);
    const rowFalloff = ((y - cy) * (y - cy)) / reach;
    let p = y * width * channels;
    for (let x = 0; x < width; x++, p += channels) {
      const shade = 1 - finish.vignette * (rowFalloff + colFalloff[x]);
      const g = table[k & mask];
      const chroma = table[(k * 7 + 3) & mask] * 0.25;
      k += 1;
      data[p] = clamp((data[p] * cr + g + chroma) * shade);
      data[p + 1] = clamp((data[p + 1] * cg + g) * shade);
      data[p + 2] = clamp((data[p + 2] * cb + g - chroma) * shade);
    }
  }
}

const clamp = (v: number) => (v < 0 ? 0 : v > 255 ? 255 : v + 0.5) | 0;
