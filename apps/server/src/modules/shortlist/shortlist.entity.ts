import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import type { Workspace } from '../workspace/workspace.entity.js';
import type { ShortlistJson, ShortlistVersionJson } from './shortlist.types.js';

/** What a version stores besides its number, note, author and time (a snapshot of run and sites). */
export type ShortlistSnapshot = Omit<
  ShortlistVersionJson,
  'version' | 'createdAt' | 'createdBy' | 'versionNote'
>;

/**
 * A named shortlist of one workspace; its content lives in numbered versions. `itemCount` and
 * `latestVersion` mirror the newest version for lists; `sharedWith` keeps the last share per user.
 */
export interface Shortlist extends BaseEntity {
  organization: Organization;
  workspace: Workspace;
  name: string;
  latestVersion: number;
  itemCount: number;
  sharedAt: Date | null;
  sharedWith: ShortlistJson['sharedWith'];
  createdBy: User | null;
}

/** One saved version: items with their scores, own stores, competitors and run settings as they were. */
export interface ShortlistVersion extends BaseEntity {
  shortlist: Shortlist;
  version: number;
  versionNote: string;
  /** The run it was built from (plain text: the run may be deleted; the snapshot stays). */
  scoringRunId: string;
  snapshot: ShortlistSnapshot;
  itemCount: number;
  createdBy: User | null;
}

export const ShortlistSchema = new EntitySchema<Shortlist>({
  name: 'Shortlist',
  tableName: 'shortlists',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    workspace: { kind: 'm:1', entity: 'Workspace', deleteRule: 'cascade' },
    name: { type: 'string', length: 120 },
    latestVersion: { type: 'integer', default: 1 },
    itemCount: { type: 'integer', default: 0 },
    sharedAt: { type: 'Date', nullable: true },
    sharedWith: { type: 'json' },
    createdBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
  },
});

export const ShortlistVersionSchema = new EntitySchema<ShortlistVersion>({
  name: 'ShortlistVersion',
  tableName: 'shortlist_versions',
  uniques: [{ properties: ['shortlist', 'version'] }],
  properties: {
    ...baseProperties(),
    shortlist: { kind: 'm:1', entity: 'Shortlist', deleteRule: 'cascade' },
    version: { type: 'integer' },
    versionNote: { type: 'text', default: '' },
    scoringRunId: { type: 'string', length: 36 },
    snapshot: { type: 'json' },
    itemCount: { type: 'integer', default: 0 },
    createdBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
  },
});
