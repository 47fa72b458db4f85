/** Customer-file shapes as the API returns them (apps/server customer-file module, contract v1). */

export type CustomerFileStatus = 'awaiting-mapping' | 'importing' | 'imported' | 'failed';
export type WeightKind = 'count' | 'spend' | 'visits' | 'other';

/** Which column holds what; names are the file's own header texts. */
export type ColumnMapping = { lon: string; lat: string; weight?: string };

export type ReportExample = { row: number; lon: string; lat: string; weight?: string };

/** Validation outcome: counts per reason, a few example rows (owners and analysts only), the outlier rule. */
export type CustomerFileReport = {
  rejected: Record<string, number>;
  flagged: Record<string, number>;
  examples: Record<string, ReportExample[]>;
  outlierRule?: { centerLon: number; centerLat: number; spreadM: number; limitM: number; applied: boolean; note: string };
};

export type CustomerFile = {
  id: string;
  workspaceId: string;
  name: string;
  sizeBytes: number;
  format: 'csv' | 'xlsx';
  status: CustomerFileStatus;
  error: { code: string; message: string } | null;
  mapping: ColumnMapping | null;
  weightKind: WeightKind | null;
  weightLabel: string | null;
  excludeFlagged: boolean;
  rowCount: number;
  acceptedCount: number;
  rejectedCount: number;
  flaggedCount: number;
  excludedCount: number;
  report: CustomerFileReport | null;
  bbox: [number, number, number, number] | null;
  totalWeight: number;
  rawFileKept?: boolean;
  privacyNote?: string;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt?: string;
  importedAt: string | null;
};

/** The mapping step's input: the file's columns, its first rows and what the server guessed. */
export type CustomerFilePreview = {
  columns: string[];
  rows: string[][];
  detected: {
    lon?: string;
    lat?: string;
    weight?: string;
    delimiter: string | null;
    decimalComma: boolean;
    encoding: string;
    hasHeader?: boolean;
  };
};
