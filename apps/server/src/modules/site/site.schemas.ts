import { SITE_KINDS } from '@demandscape/core';
import { z } from 'zod';

const kinds = SITE_KINDS as readonly ['candidate', 'own', 'competitor'];
const kindMessage = `must be one of ${kinds.join(', ')}`;

export const kindField = z.enum(kinds, { message: kindMessage });
const nameField = z.string({ message: 'is required' }).trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters');
const finite = (what: string) => z.number({ message: `must be a number (${what})` }).finite(`must be a finite number (${what})`);
export const lonField = finite('longitude in degrees').min(-180, 'must be between -180 and 180 degrees (longitude)').max(180, 'must be between -180 and 180 degrees (longitude)');
export const latField = finite('latitude in degrees').min(-90, 'must be between -90 and 90 degrees (latitude)').max(90, 'must be between -90 and 90 degrees (latitude)');
export const attractivenessField = finite('e.g. sales floor m²').positive('must be greater than 0 (e.g. sales floor m² or a 1–10 score)');
const labelField = z.string({ message: 'must be text' }).trim().max(60, 'must be at most 60 characters');
export const notesField = z.string({ message: 'must be text' }).trim().max(2000, 'must be at most 2000 characters');

export const siteCreateSchema = z.object({
  kind: kindField,
  name: nameField,
  lon: lonField,
  lat: latField,
  attractiveness: attractivenessField,
  attractivenessLabel: labelField.optional(),
  notes: notesField.optional(),
});

export const siteUpdateSchema = z
  .object({
    kind: kindField.optional(),
    name: nameField.optional(),
    lon: lonField.optional(),
    lat: latField.optional(),
    attractiveness: attractivenessField.optional(),
    attractivenessLabel: labelField.optional(),
    notes: notesField.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'send at least one of kind, name, lon, lat, attractiveness, attractivenessLabel, notes' })
  .refine((v) => (v.lon === undefined) === (v.lat === undefined), { message: 'a move needs both lon and lat', path: ['lat'] });

export const siteListQuerySchema = z.object({ kind: kindField.optional() });

export type SiteCreateInput = z.infer<typeof siteCreateSchema>;
export type SiteUpdateInput = z.infer<typeof siteUpdateSchema>;

const columnName = z.string({ message: 'must be a column name (text) or null' }).trim().min(1, 'must be a column name or null (no column)').nullable();

/** `mapping` of an import: fields left out take the guessed column; null = no column. */
export const siteMappingSchema = z.object(
  {
    name: columnName.optional(),
    lon: columnName.optional(),
    lat: columnName.optional(),
    kind: columnName.optional(),
    attractiveness: columnName.optional(),
    attractivenessLabel: columnName.optional(),
    notes: columnName.optional(),
  },
  { message: 'must be a JSON object like {"name":"Site name","lon":"Longitude","lat":"Latitude"}' },
).strict();

/** The text fields sent with an import upload (multipart form fields are strings). */
export const siteImportFieldsSchema = z.object({
  mapping: z
    .string()
    .optional()
    .transform((text, ctx) => {
      if (text === undefined || text.trim() === '') return undefined;
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: 'must be JSON, e.g. {"name":"Site name","lon":"Longitude","lat":"Latitude"}' });
        return z.NEVER;
      }
    })
    .pipe(siteMappingSchema.optional()),
  defaultKind: z
    .string()
    .optional()
    .transform((text) => (text === undefined || text.trim() === '' ? undefined : text.trim().toLowerCase()))
    .pipe(kindField.optional()),
  defaultAttractiveness: z
    .string()
    .optional()
    .transform((text) => (text === undefined || text.trim() === '' ? undefined : Number(text.trim())))
    .pipe(attractivenessField.optional()),
});

export type SiteImportFields = z.infer<typeof siteImportFieldsSchema>;
