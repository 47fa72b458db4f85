import FFT from 'fft.js';
import { throwIfAborted } from '../errors.js';

/**
 * Two-dimensional FFT of a real grid on power-of-two sizes, built on fft.js (radix-4).
 *
 * A real grid's spectrum is Hermitian, F(u, v) = conj F(px − u, py − v), so only the columns
 * u = 0 … px/2 are kept ("half spectrum"). Layout: column-major complex, column u holds py
 * complex values contiguously at [2·(u·py + v), 2·(u·py + v) + 1] — column transforms then run
 * on contiguous memory and row transforms use fft.js's real transform.
 */

/** Rows between abort checks; one row of 4096 points is well under a millisecond. */
const CHECK_EVERY = 64;

/**
 * The smallest power of two ≥ n (and ≥ 2, fft.js's minimum size).
 *
 * @param n required length
 * @returns a power of two
 * @example
 * fftSize(1100); // 2048
 */
export function fftSize(n: number): number {
  let p = 2;
  while (p < n) p *= 2;
  return p;
}

/**
 * Forward 2-D FFT of a real px × py grid (row-major, index x + y·px) into its half spectrum.
 *
 * @param real px·py values; rows that are entirely zero are skipped
 * @param px width, a power of two
 * @param py height, a power of two
 * @param signal optional abort signal, checked between row blocks
 * @returns the half spectrum, length 2·(px/2 + 1)·py (column-major complex, see module notes)
 * @example
 * const spec = fft2dRealForward(grid, 256, 128);
 */
export function fft2dRealForward(
  real: Float64Array,
  px: number,
  py: number,
  signal?: AbortSignal,
): Float64Array {
  const half = px / 2 + 1;
  const spec = new Float64Array(2 * half * py);
  const rowFft = new FFT(px);
  const rowOut = new Float64Array(2 * px);
  for (let y = 0; y < py; y++) {
    if (y % CHECK_EVERY === 0) throwIfAborted(signal);
    const row = real.subarray(y * px, (y + 1) * px);
    let nonZero = false;
    for (let x = 0; x < px; x++) {
      if (row[x] !== 0) {
        nonZero = true;
        break;
      }
    }
    if (!nonZero) continue;
    rowFft.realTransform(rowOut, row);
    // realTransform fills bins 0 … px/2, exactly the half we keep.
    for (let u = 0; u < half; u++) {
      const k = 2 * (u * py + y);
      spec[k] = rowOut[2 * u];
      spec[k + 1] = rowOut[2 * u + 1];
    }
  }
  const colFft = new FFT(py);
  const colOut = new Float64Array(2 * py);
  for (let u = 0; u < half; u++) {
    if (u % CHECK_EVERY === 0) throwIfAborted(signal);
    const col = spec.subarray(2 * u * py, 2 * (u + 1) * py);
    colFft.transform(colOut, col);
    col.set(colOut);
  }
  return spec;
}

/**
 * Inverse of {@link fft2dRealForward} for a window of the real result: writes
 * out[(x − x0) + (y − y0)·w] = f(x, y) for x0 ≤ x < x0 + w, y0 ≤ y < y0 + h.
 * The half spectrum is overwritten (its columns are inverse-transformed in place).
 *
 * @param spec half spectrum from {@link fft2dRealForward} (possibly multiplied by a filter)
 * @param px width, a power of two
 * @param py height, a power of two
 * @param x0 first column of the window
 * @param y0 first row of the window
 * @param w window width
 * @param h window height
 * @param out destination, length ≥ w·h
 * @param signal optional abort signal
 * @returns nothing; the window is written into `out`
 * @example
 * fft2dRealInverseWindow(spec, 256, 128, 10, 10, 100, 50, out);
 */
export function fft2dRealInverseWindow(
  spec: Float64Array,
  px: number,
  py: number,
  x0: number,
  y0: number,
  w: number,
  h: number,
  out: Float64Array,
  signal?: AbortSignal,
): void {
  const half = px / 2 + 1;
  const colFft = new FFT(py);
  const colOut = new Float64Array(2 * py);
  for (let u = 0; u < half; u++) {
    if (u % CHECK_EVERY === 0) throwIfAborted(signal);
    const col = spec.subarray(2 * u * py, 2 * (u + 1) * py);
    colFft.inverseTransform(colOut, col);
    col.set(colOut);
  }
  const rowFft = new FFT(px);
  const rowIn = new Float64Array(2 * px);
  const rowOut = new Float64Array(2 * px);
  for (let y = y0; y < y0 + h; y++) {
    if ((y - y0) % CHECK_EVERY === 0) throwIfAborted(signal);
    for (let u = 0; u < half; u++) {
      const k = 2 * (u * py + y);
      rowIn[2 * u] = spec[k];
      rowIn[2 * u + 1] = spec[k + 1];
    }
    // The row of a real result is Hermitian in u: fill the right half by conjugation.
    for (let u = half; u < px; u++) {
      const k = 2 * ((px - u) * py + y);
      rowIn[2 * u] = spec[k];
      rowIn[2 * u + 1] = -spec[k + 1];
    }
    rowFft.inverseTransform(rowOut, rowIn);
    const base = (y - y0) * w;
    for (let x = 0; x < w; x++) out[base + x] = rowOut[2 * (x0 + x)];
  }
}
