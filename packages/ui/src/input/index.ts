export { Input, controlClass, type InputProps } from './input';
