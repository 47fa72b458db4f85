export { TextAreaField, type TextAreaFieldProps } from './textarea';
