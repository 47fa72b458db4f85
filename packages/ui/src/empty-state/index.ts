export { EmptyState, type EmptyStateProps } from './empty-state';
