export { Card, CardHeader, type CardHeaderProps } from './card';
