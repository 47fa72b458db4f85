export { Stat, type StatProps } from './stat';
