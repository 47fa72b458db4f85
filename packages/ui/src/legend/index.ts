export * from './colour-legend';
