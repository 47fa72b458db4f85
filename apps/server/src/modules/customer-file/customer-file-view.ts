import type { CustomerFile, CustomerFileReport } from './customer-file.entity.js';

/** Said wherever customer files are shown (API and UI). */
export const PRIVACY_NOTE =
  'Only coordinates and the weight are kept; other columns (names, addresses, e-mails) are discarded at import.';

/** A customer file as the API returns it. */
export interface CustomerFileView {
  id: string;
  workspaceId: string;
  name: string;
  sizeBytes: number;
  format: 'csv' | 'xlsx';
  status: CustomerFile['status'];
  error: { code: string; message: string } | null;
  detected: CustomerFile['detected'];
  mapping: CustomerFile['mapping'];
  weightKind: CustomerFile['weightKind'];
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
  /** The raw upload is still on the server (before a successful import, or after a failed one). */
  rawFileKept: boolean;
  privacyNote: string;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt: string;
  importedAt: string | null;
}

/**
 * The API shape of a customer file. Without `withExamples` the report keeps its counts but drops
 * the example rows (they hold raw coordinates, which only owners and analysts may see).
 * @param f - the entity (createdBy populated or a reference)
 * @param withExamples - include report examples
 * @returns the view
 * @example
 * res.json({ customerFile: customerFileView(file, role === 'analyst') });
 */
export function customerFileView(f: CustomerFile, withExamples: boolean): CustomerFileView {
  const report = f.report ? { ...f.report, examples: withExamples ? f.report.examples : {} } : null;
  return {
    id: f.id,
    workspaceId: f.workspace.id,
    name: f.name,
    sizeBytes: f.sizeBytes,
    format: f.format,
    status: f.status,
    error: f.error,
    detected: f.detected,
    mapping: f.mapping,
    weightKind: f.weightKind,
    weightLabel: f.weightLabel,
    excludeFlagged: f.excludeFlagged,
    rowCount: f.rowCount,
    acceptedCount: f.acceptedCount,
    rejectedCount: f.rejectedCount,
    flaggedCount: f.flaggedCount,
    excludedCount: f.excludedCount,
    report,
    bbox: f.bbox,
    totalWeight: f.totalWeight,
    rawFileKept: f.storedName !== null,
    privacyNote: PRIVACY_NOTE,
    createdBy:
      f.createdBy && f.createdBy.name !== undefined
        ? { id: f.createdBy.id, name: f.createdBy.name }
        : null,
    createdAt: f.createdAt.toISOString(),
    updatedAt: f.updatedAt.toISOString(),
    importedAt: f.importedAt ? f.importedAt.toISOString() : null,
  };
}
