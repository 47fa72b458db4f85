export { Badge, type BadgeProps } from './badge';
