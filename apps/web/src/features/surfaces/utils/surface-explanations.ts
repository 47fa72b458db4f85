import type { BandwidthRule, KernelName } from '../types';

/** Each kernel in one line: what it does to the surface. Quartic is the suggested default. */
export const kernelOptions: { value: KernelName; label: string; explanation: string }[] = [
  {
    value: 'quartic',
    label: 'Quartic (suggested)',
    explanation: 'Smooth bell that reaches exactly zero at the bandwidth radius; the usual choice for customer demand.',
  },
  {
    value: 'epanechnikov',
    label: 'Epanechnikov',
    explanation: 'Rounded dome, zero beyond the radius; statistically the most efficient, slightly less smooth at the edge.',
  },
  {
    value: 'triweight',
    label: 'Triweight',
    explanation: 'Like quartic but more peaked; keeps tight clusters more distinct.',
  },
  {
    value: 'triangular',
    label: 'Triangular',
    explanation: 'Weight falls in a straight line to zero at the radius; simple to explain, with a sharp peak at each customer.',
  },
  {
    value: 'uniform',
    label: 'Uniform disc',
    explanation: 'Every customer within the radius counts the same: a moving count per area, with visible disc edges.',
  },
  {
    value: 'gaussian',
    label: 'Gaussian',
    explanation: 'Normal curve with no hard edge; the bandwidth is its standard deviation, so it reaches about 3× further.',
  },
];

/** Each published bandwidth rule in one line. */
export const ruleOptions: { value: BandwidthRule; label: string; explanation: string }[] = [
  {
    value: 'normal-reference',
    label: 'Normal reference (Silverman’s rule)',
    explanation: 'Fast; from the spread and number of customers. Suits one broad cluster, over-smooths several tight ones.',
  },
  {
    value: 'likelihood-cv',
    label: 'Likelihood cross-validation',
    explanation: 'Picks the bandwidth that best predicts each customer from the others; follows several clusters, slower.',
  },
  {
    value: 'least-squares-cv',
    label: 'Least-squares cross-validation',
    explanation: 'Minimises the estimated error of the surface; often narrower than the likelihood choice, can be noisy.',
  },
];

export const methodOptions = [
  { value: 'auto', label: 'Automatic (suggested)', explanation: 'Uses the exact sum for small runs and the faster binned FFT method for large ones.' },
  { value: 'exact', label: 'Exact sum', explanation: 'Adds every customer’s kernel into every cell; exact, slowest on big grids.' },
  { value: 'binned', label: 'Binned (linear binning + FFT)', explanation: 'Spreads customers onto the grid first, then convolves; fast, within 0.1 % of the peak at the suggested cell size.' },
] as const;

export const explanations = {
  customerFile: 'The imported customer file whose coordinates and weights the surface spreads out.',
  kernel: 'The shape each customer’s demand is spread with. The bandwidth matters far more than the shape.',
  bandwidth:
    'How far each customer’s demand spreads. Wider: smoother, fewer hot spots; narrower: more detail and more noise. Suggested: a published rule.',
  bandwidthValue:
    'In metres: the kernel radius (nothing counts beyond it) for all kernels except Gaussian, where it is the standard deviation.',
  cellSize:
    'The side of one grid cell in metres. Smaller cells show finer shapes but cost more credits; the suggested size is a fraction of the bandwidth, small enough not to change the result.',
  studyArea:
    'Where the surface is computed: the customers’ extent plus one bandwidth, or a polygon you upload (e.g. the city limits).',
  unit: 'Demand is shown per square kilometre or per square mile (1 sq mi = 2.589988 km²).',
  edgeCorrection:
    'Raises demand near the study-area boundary, where part of each kernel falls outside and would otherwise be lost (Diggle’s correction). Use with a polygon study area.',
  adaptive:
    'Narrows the bandwidth where customers are dense and widens it where they are sparse (Abramson’s square-root law). Slower; always uses the exact sum.',
  method: 'How the sum is computed; the result is the same within a stated tolerance.',
  name: 'Optional; otherwise the file, kernel and bandwidth name the surface.',
};

/** Said wherever a number from a surface feeds a decision (PRODUCT.md). */
export const CAUTION_LINE =
  'The surface is an estimate from a sample of customers; check leases, zoning and local rules with licensed professionals.';
