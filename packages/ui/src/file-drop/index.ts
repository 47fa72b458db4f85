export { FileDrop, type FileDropProps } from './file-drop';
