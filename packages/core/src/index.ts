export * from './types.js';
export * from './errors.js';
export * from './kernels/kernels.js';
