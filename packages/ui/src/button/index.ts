export { Button, buttonVariants, type ButtonProps } from './button';
