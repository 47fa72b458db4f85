import { invariant } from '../errors.js';
import { fft2dRealForward, fft2dRealInverseWindow, fftSize } from './fft-2d.js';

/**
 * Linear (not circular) convolution of a real grid with a small point-symmetric stencil through
 * a zero-padded 2-D FFT. A stencil with s(−dx, −dy) = s(dx, dy) has a real spectrum, so only
 * that real part is stored (half the memory of a complex filter).
 *
 * No wrap-around: the input's data lie in nx × ny cells (zeros around them, "padding"), results
 * are read only in windows at least rx (ry) cells inside that block, and the FFT size is ≥ nx
 * (ny). Then for output a and input b, |a − b| ≤ nx − 1 − rx, so a − b ± px never falls inside
 * the stencil's reach [−rx, rx]: nothing crosses the periodic seam.
 */
export interface FftConvolution {
  /** FFT width and height (powers of two). */
  readonly px: number;
  readonly py: number;
  /** Input block and stencil radii the plan was made for. */
  readonly nx: number;
  readonly ny: number;
  readonly rx: number;
  readonly ry: number;
  /** Real spectrum of the stencil, (px/2 + 1)·py values, column-major like the half spectrum. */
  readonly filter: Float64Array;
}

/**
 * Prepares the stencil's spectrum for inputs up to nx × ny.
 *
 * @param stencil (2rx + 1) × (2ry + 1) values, row-major, centre at (rx, ry); point-symmetric
 * @param rx stencil radius in columns
 * @param ry stencil radius in rows
 * @param nx input width the plan must hold
 * @param ny input height the plan must hold
 * @param signal optional abort signal
 * @returns the plan: sizes and the stencil's real spectrum
 * @example
 * const plan = fftConvolutionPlan(stencil, 50, 50, 1100, 1100); // px = py = 2048
 */
export function fftConvolutionPlan(
  stencil: Float64Array,
  rx: number,
  ry: number,
  nx: number,
  ny: number,
  signal?: AbortSignal,
): FftConvolution {
  const sw = 2 * rx + 1;
  invariant(stencil.length === sw * (2 * ry + 1), 'stencil size matches its radii');
  const px = fftSize(nx);
  const py = fftSize(ny);
  // Place the stencil with its centre at (0, 0), negative offsets wrapping to the far side.
  const placed = new Float64Array(px * py);
  for (let dy = -ry; dy <= ry; dy++) {
    const row = ((dy + py) % py) * px;
    for (let dx = -rx; dx <= rx; dx++) {
      placed[row + ((dx + px) % px)] = stencil[dx + rx + (dy + ry) * sw];
    }
  }
  const spec = fft2dRealForward(placed, px, py, signal);
  const half = px / 2 + 1;
  const filter = new Float64Array(half * py);
  let maxRe = 0;
  let maxIm = 0;
  for (let k = 0; k < filter.length; k++) {
    filter[k] = spec[2 * k];
    maxRe = Math.max(maxRe, Math.abs(spec[2 * k]));
    maxIm = Math.max(maxIm, Math.abs(spec[2 * k + 1]));
  }
  invariant(maxIm <= 1e-9 * maxRe + 1e-300, 'stencil is point-symmetric (real spectrum)');
  return { px, py, nx, ny, rx, ry, filter };
}

/**
 * Convolves `input` (px × py row-major, data in the top-left nx × ny, zeros elsewhere) with the
 * plan's stencil and writes the window [x0, x0 + w) × [y0, y0 + h) of the result into `out`.
 *
 * @param plan from {@link fftConvolutionPlan}
 * @param input px·py values
 * @param x0 window's first column
 * @param y0 window's first row
 * @param w window width
 * @param h window height
 * @param out destination, length ≥ w·h, row-major with row length w
 * @param signal optional abort signal
 * @returns nothing; `out` holds the window
 * @example
 * fftConvolutionApply(plan, binned, 50, 50, 1000, 1000, surface);
 */
export function fftConvolutionApply(
  plan: FftConvolution,
  input: Float64Array,
  x0: number,
  y0: number,
  w: number,
  h: number,
  out: Float64Array,
  signal?: AbortSignal,
): void {
  const { px, py, filter } = plan;
  invariant(input.length === px * py, 'input has the plan size');
  invariant(
    x0 >= plan.rx && y0 >= plan.ry && x0 + w <= plan.nx - plan.rx && y0 + h <= plan.ny - plan.ry,
    'output window lies at least one stencil radius inside the input block (no wrap-around)',
  );
  const spec = fft2dRealForward(input, px, py, signal);
  for (let k = 0; k < filter.length; k++) {
    const f = filter[k];
    spec[2 * k] *= f;
    spec[2 * k + 1] *= f;
  }
  fft2dRealInverseWindow(spec, px, py, x0, y0, w, h, out, signal);
}
