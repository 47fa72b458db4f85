import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201000000Initial } from './2026-12-01-initial.js';
import { Migration20261202000000Billing } from './2026-12-02-billing.js';
import { Migration20261202000000CustomerFiles } from './2026-12-02-customer-files.js';
import { Migration20261202000100Surfaces } from './2026-12-02-surfaces.js';
import { Migration20261202000200Sites } from './2026-12-02-sites.js';
import { Migration20261202000300Scoring } from './2026-12-02-scoring.js';
import { Migration20261202000400Shortlists } from './2026-12-02-shortlists.js';

/** Checked-in migrations in order; listed explicitly so built and source runs find the same set. */
export const migrationsList: MigrationObject[] = [
  { name: '2026-12-01-initial', class: Migration20261201000000Initial },
  { name: '2026-12-02-customer-files', class: Migration20261202000000CustomerFiles },
  { name: '2026-12-02-billing', class: Migration20261202000000Billing },
  { name: '2026-12-02-surfaces', class: Migration20261202000100Surfaces },
  { name: '2026-12-02-sites', class: Migration20261202000200Sites },
  { name: '2026-12-02-scoring', class: Migration20261202000300Scoring },
  { name: '2026-12-02-shortlists', class: Migration20261202000400Shortlists },
];
