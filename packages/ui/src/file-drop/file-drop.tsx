import { useId, useRef, useState, type DragEvent, type ReactNode } from 'react';
import { cn } from '../lib/cn';

export type FileDropProps = {
  /** Called with the chosen file (dropped or picked); only the first of several is used. */
  onFile: (file: File) => void;
  /** `accept` for the picker, e.g. ".csv,.xlsx". Dropped files are not filtered: the caller checks them. */
  accept?: string;
  /** Main line, e.g. "Drop a customer file here". */
  title: ReactNode;
  /** Smaller lines: formats, size limit, privacy. */
  children?: ReactNode;
  /** Text of the picker button. */
  pickLabel?: string;
  disabled?: boolean;
  className?: string;
};

/**
 * A drop zone with a file-picker button. Works with the keyboard through the button; the whole zone
 * highlights while a file is dragged over it.
 * @param props file handler, accept filter, texts and disabled state
 * @returns the drop zone
 * @example <FileDrop accept=".csv" title="Drop a CSV here" onFile={(f) => upload(f)}>Up to 200 MB</FileDrop>
 */
export function FileDrop({ onFile, accept, title, children, pickLabel = 'Choose a file', disabled = false, className }: FileDropProps) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [dragging, setDragging] = useState(false);

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    if (disabled) return;
    const file = event.dataTransfer.files?.[0];
    if (file) onFile(file);
  };

  return (
    <div
      onDragOver={(event) => {
        event.preventDefault();
        if (!disabled) setDragging(true);
      }}
      onDragLeave={() => setDragging(false)}
      onDrop={onDrop}
      data-dragging={dragging || undefined}
      className={cn(
        'flex flex-col items-center gap-2 rounded-panel border-2 border-dashed border-line-strong bg-surface px-6 py-8 text-center transition-colors',
        dragging && 'border-accent bg-accent-soft',
        disabled && 'opacity-60',
        className,
      )}
    >
      <p className="text-sm font-semibold text-ink">{title}</p>
      {children ? <div className="text-xs text-ink-muted">{children}</div> : null}
      <label
        htmlFor={inputId}
        className={cn(
          'mt-2 inline-flex h-10 cursor-pointer items-center rounded-control border border-line-strong bg-surface px-4 text-sm font-medium text-ink hover:bg-sunken has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-accent',
          disabled && 'cursor-not-allowed',
        )}
      >
        {pickLabel}
        <input
          ref={inputRef}
          id={inputId}
          type="file"
          accept={accept}
          disabled={disabled}
          className="sr-only"
          onChange={(event) => {
            const file = event.target.files?.[0];
            if (file) onFile(file);
            // Reset so choosing the same file again still fires a change.
            if (inputRef.current) inputRef.current.value = '';
          }}
        />
      </label>
    </div>
  );
}
