/** Site shapes as the API returns them (apps/server site module; contract "Sites routes"). */

export type SiteKind = 'candidate' | 'own' | 'competitor';

export type Site = {
  id: string;
  /** Sent by newer servers; the list is already scoped to one workspace. */
  workspaceId?: string;
  kind: SiteKind;
  name: string;
  /** WGS84 degrees. */
  lon: number;
  lat: number;
  /** The Huff model's attractiveness, in the unit `attractivenessLabel` names (one unit per workspace). */
  attractiveness: number;
  attractivenessLabel: string;
  notes: string;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt: string;
};

/** Body of `POST …/sites`; `PATCH …/sites/:id` takes any part of it (a move sends lon and lat together). */
export type SiteInput = {
  kind: SiteKind;
  name: string;
  lon: number;
  lat: number;
  attractiveness: number;
  attractivenessLabel?: string;
  notes?: string;
};

/** Which column of an import file holds each field (header names), null when none. */
export type SiteColumnMapping = {
  name: string | null;
  lon: string | null;
  lat: string | null;
  kind: string | null;
  attractiveness: string | null;
  attractivenessLabel: string | null;
  notes: string | null;
};

/** `POST …/sites/import/preview`: the file's columns, first rows and the guessed mapping. */
export type SiteImportPreview = {
  format: 'csv' | 'xlsx';
  columns: string[];
  sampleRows: string[][];
  rowCount: number;
  mapping: SiteColumnMapping;
  /** Required fields the server could not find a column for. */
  missing: string[];
};

/** One problem in one row of an import file (400 SITE_ROWS_INVALID lists them all). */
export type SiteRowError = { row: number; field: string; message: string };

/** A position picked on the map for the site form; `seq` grows with each click so the same spot counts twice. */
export type SitePick = { lon: number; lat: number; seq: number };
