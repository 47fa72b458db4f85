export { Select, type SelectProps } from './select';
