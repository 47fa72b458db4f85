export { ProgressBar, type ProgressBarProps } from './progress-bar';
