import { Field, Select } from '@demandscape/ui';
import { dateText } from '../../../lib/format';
import type { ShortlistVersionEntry } from '../types';

export type VersionPickerProps = {
  versions: ShortlistVersionEntry[];
  /** The version shown. */
  value: number;
  onChange: (version: number) => void;
};

/**
 * Chooses which saved version of a shortlist to read; the newest is marked "latest".
 * @param props the versions, the one shown and the change handler
 * @returns a labelled select
 * @example <VersionPicker versions={s.versions} value={s.version.version} onChange={setVersion} />
 */
export function VersionPicker({ versions, value, onChange }: VersionPickerProps) {
  const sorted = [...versions].sort((a, b) => b.version - a.version);
  const latest = sorted[0]?.version;
  return (
    <Field label="Version" className="w-full max-w-2xl">
      {(control) => (
        <Select {...control} value={String(value)} onChange={(e) => onChange(Number(e.target.value))}>
          {sorted.map((v) => (
            <option key={v.version} value={v.version}>
              {`Version ${v.version}${v.version === latest ? ' (latest)' : ''} · ${dateText(v.createdAt)}${v.createdBy ? ` · ${v.createdBy.name}` : ''} · ${v.itemCount} ${v.itemCount === 1 ? 'site' : 'sites'}${v.versionNote ? ` · ${v.versionNote}` : ''}`}
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}
