import { z } from 'zod';

/** Most sites one shortlist version may hold. */
export const SHORTLIST_MAX_ITEMS = 50;

const nameField = z
  .string({ message: 'is required' })
  .trim()
  .min(1, 'must not be empty')
  .max(120, 'must be at most 120 characters');
const idField = (what: string) =>
  z
    .string({ message: `must be ${what}` })
    .trim()
    .min(1, `must be ${what}`)
    .max(64, `must be ${what}`);
const noteField = z
  .string({ message: 'must be text' })
  .trim()
  .max(2000, 'must be at most 2000 characters');
const itemsField = z
  .array(
    z.object({
      siteId: idField('the id of a candidate site of the scoring run'),
      note: noteField.optional(),
    }),
    { message: 'must be a list of { siteId, note? }' },
  )
  .min(1, 'must list at least one candidate site')
  .max(SHORTLIST_MAX_ITEMS, `must list at most ${SHORTLIST_MAX_ITEMS} sites`);
const versionNoteField = z
  .string({ message: 'must be text' })
  .trim()
  .max(500, 'must be at most 500 characters');

export const shortlistCreateSchema = z.object({
  name: nameField,
  scoringRunId: idField('the id of a succeeded scoring run of this workspace'),
  items: itemsField,
  versionNote: versionNoteField.optional(),
});

export const shortlistVersionSchema = z.object({
  scoringRunId: idField('the id of a succeeded scoring run of this workspace'),
  items: itemsField,
  versionNote: versionNoteField.optional(),
});

export const shortlistRenameSchema = z.object({ name: nameField });

export const shortlistShareSchema = z.object({
  message: z
    .string({ message: 'must be text' })
    .trim()
    .max(2000, 'must be at most 2000 characters')
    .optional(),
  userIds: z
    .array(idField('a user id'), { message: 'must be a list of user ids' })
    .min(1, 'must name at least one member (or leave it out to share with every executive)')
    .max(100, 'must name at most 100 members')
    .optional(),
});

export const shortlistVersionQuerySchema = z.object({
  version: z.coerce
    .number({ message: 'must be a version number' })
    .int('must be a whole version number')
    .positive('must be a version number from 1')
    .optional(),
});

export type ShortlistCreateInput = z.infer<typeof shortlistCreateSchema>;
export type ShortlistVersionInput = z.infer<typeof shortlistVersionSchema>;
export type ShortlistShareInput = z.infer<typeof shortlistShareSchema>;
