export { Field, type FieldProps, type FieldControlProps } from './field';
export { TextField, type TextFieldProps } from './text-field';
