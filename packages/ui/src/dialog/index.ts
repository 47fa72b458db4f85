export { Dialog, type DialogProps } from './dialog';
