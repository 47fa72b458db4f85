export { Alert, type AlertProps } from './alert';
