export { LogoMark, type LogoMarkProps } from './logo-mark';
