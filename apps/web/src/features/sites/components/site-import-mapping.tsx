import { Field, Select, TextField } from '@demandscape/ui';
import { MappedColumnsTable } from '../../../components/tables/mapped-columns-table';
import type { SiteColumnMapping, SiteImportPreview, SiteKind } from '../types';
import { siteExplanations, siteKindOrder, siteKindWords } from '../utils/site-explanations';

/** How a used column is marked above the preview when its field name is not plain enough. */
const roleWords: Partial<Record<keyof SiteColumnMapping, string>> = { lon: 'longitude', lat: 'latitude', attractivenessLabel: 'unit' };

/** Each mapped field: label, whether a column is required, and its one-line explanation. */
export const siteMappingFields: Array<{ key: keyof SiteColumnMapping; label: string; required: boolean; hint: string }> = [
  { key: 'name', label: 'Name column', required: true, hint: 'The site’s name as shown on the map and in rankings.' },
  { key: 'lon', label: 'Longitude column', required: true, hint: 'East–west position in decimal degrees (−180 to 180).' },
  { key: 'lat', label: 'Latitude column', required: true, hint: 'North–south position in decimal degrees (−90 to 90).' },
  { key: 'kind', label: 'Kind column (optional)', required: false, hint: 'candidate, own or competitor per row; without it every row takes the default kind.' },
  {
    key: 'attractiveness',
    label: 'Attractiveness column (optional)',
    required: false,
    hint: 'What draws customers, e.g. sales floor m²; without it every row takes the default value.',
  },
  { key: 'attractivenessLabel', label: 'Attractiveness unit column (optional)', required: false, hint: 'The unit of that measure per row, e.g. “m²”.' },
  { key: 'notes', label: 'Notes column (optional)', required: false, hint: 'Free text kept with each site.' },
];

/** The mapping step's choices: a column per field and the defaults for fields without one. */
export type SiteImportChoices = { mapping: SiteColumnMapping; defaultKind: SiteKind; defaultAttractiveness: string };

export type SiteImportMappingProps = {
  preview: SiteImportPreview;
  choices: SiteImportChoices;
  onChange: (choices: SiteImportChoices) => void;
  /** Messages by field key (`mapping.name`, `defaultAttractiveness` …). */
  errors: Record<string, string>;
};

/**
 * Which column holds each site field (pre-filled from the server's guess, editable), the defaults for
 * kind and attractiveness, and the file's first rows with the chosen columns marked.
 * @param props the preview, the current choices, the change handler and field errors
 * @returns the mapping controls and the preview table
 * @example <SiteImportMapping preview={p} choices={c} onChange={setChoices} errors={{}} />
 */
export function SiteImportMapping({ preview, choices, onChange, errors }: SiteImportMappingProps) {
  const { mapping } = choices;
  const setColumn = (key: keyof SiteColumnMapping, column: string) => onChange({ ...choices, mapping: { ...mapping, [key]: column || null } });
  const roleOf = (column: string) => siteMappingFields.find((f) => mapping[f.key] === column);
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-2">
        {siteMappingFields.map((field) => (
          <Field key={field.key} label={field.label} hint={field.hint} error={errors[`mapping.${field.key}`]}>
            {(p) => (
              <Select {...p} value={mapping[field.key] ?? ''} onChange={(e) => setColumn(field.key, e.target.value)}>
                <option value="">{field.required ? 'Choose a column…' : 'No column'}</option>
                {preview.columns.map((column) => (
                  <option key={column} value={column}>
                    {column}
                  </option>
                ))}
              </Select>
            )}
          </Field>
        ))}
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Default kind" hint={siteExplanations.defaultKind} error={errors.defaultKind}>
          {(p) => (
            <Select {...p} value={choices.defaultKind} disabled={mapping.kind !== null} onChange={(e) => onChange({ ...choices, defaultKind: e.target.value as SiteKind })}>
              {siteKindOrder.map((kind) => (
                <option key={kind} value={kind}>
                  {siteKindWords[kind].one}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <TextField
          label="Default attractiveness"
          inputMode="decimal"
          placeholder="e.g. 150"
          hint={siteExplanations.defaultAttractiveness}
          error={errors.defaultAttractiveness}
          disabled={mapping.attractiveness !== null}
          value={choices.defaultAttractiveness}
          onChange={(e) => onChange({ ...choices, defaultAttractiveness: e.target.value })}
        />
      </div>
      <MappedColumnsTable
        columns={preview.columns}
        rows={preview.sampleRows}
        roleOf={(column) => {
          const role = roleOf(column);
          return role ? (roleWords[role.key] ?? role.key) : null;
        }}
        unusedLabel="not used"
      />
    </div>
  );
}

/**
 * Checks the choices before anything is sent: required columns, two different position columns, a
 * default attractiveness > 0 when no column gives one.
 * @param choices the mapping step's choices
 * @returns messages by field key; empty when the import can go
 * @example siteImportChoiceErrors({ mapping: { …, name: null }, defaultKind: 'candidate', defaultAttractiveness: '' })
 */
export function siteImportChoiceErrors(choices: SiteImportChoices): Record<string, string> {
  const errors: Record<string, string> = {};
  const { mapping } = choices;
  for (const field of siteMappingFields) {
    if (field.required && !mapping[field.key]) errors[`mapping.${field.key}`] = `Choose the column that holds the ${field.key === 'lon' ? 'longitude' : field.key === 'lat' ? 'latitude' : 'name'}.`;
  }
  if (mapping.lon && mapping.lon === mapping.lat) errors['mapping.lat'] = 'Longitude and latitude must come from two different columns.';
  if (!mapping.attractiveness) {
    const value = Number(choices.defaultAttractiveness);
    if (choices.defaultAttractiveness.trim() === '' || !Number.isFinite(value) || value <= 0) {
      errors.defaultAttractiveness = 'The file has no attractiveness column: enter the value every site gets, greater than 0 (e.g. 150).';
    }
  }
  return errors;
}
