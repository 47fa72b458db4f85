import type { CustomerFile, CustomerFilePreview } from '../types';

/**
 * A customer file as the API returns it (invented Larchloaf loyalty export), awaiting mapping by default.
 * @param overrides fields to set
 * @returns the file
 * @example createCustomerFile({ status: 'imported', acceptedCount: 480 })
 */
export function createCustomerFile(overrides: Partial<CustomerFile> = {}): CustomerFile {
  return {
    id: 'cf_1',
    workspaceId: 'wsp_1',
    name: 'larchloaf-loyalty.csv',
    sizeBytes: 48_213,
    format: 'csv',
    status: 'awaiting-mapping',
    error: null,
    mapping: null,
    weightKind: null,
    weightLabel: null,
    excludeFlagged: false,
    rowCount: 0,
    acceptedCount: 0,
    rejectedCount: 0,
    flaggedCount: 0,
    excludedCount: 0,
    report: null,
    bbox: null,
    totalWeight: 0,
    rawFileKept: true,
    privacyNote: 'Only coordinates and the weight are kept; other columns (names, addresses, e-mails) are discarded at import.',
    createdBy: { id: 'usr_analyst', name: 'Tamsin Reedholm' },
    createdAt: '2026-12-01T09:00:00.000Z',
    updatedAt: '2026-12-01T09:00:00.000Z',
    importedAt: null,
    ...overrides,
  };
}

/**
 * An imported file with a report: rejected and flagged reasons with counts and examples.
 * @param overrides fields to set
 * @returns the file
 * @example createImportedCustomerFile({ excludeFlagged: true })
 */
export function createImportedCustomerFile(overrides: Partial<CustomerFile> = {}): CustomerFile {
  return createCustomerFile({
    status: 'imported',
    mapping: { lon: 'x_coord', lat: 'y_coord', weight: 'spend_eur' },
    weightKind: 'spend',
    weightLabel: 'annual spend (€)',
    rowCount: 500,
    acceptedCount: 488,
    rejectedCount: 12,
    flaggedCount: 5,
    excludedCount: 0,
    report: {
      rejected: { 'likely-swapped': 7, 'null-island': 5 },
      flagged: { 'duplicate-row': 2, outlier: 3 },
      examples: { 'likely-swapped': [{ row: 14, lon: '-38.49', lat: '144.5', weight: '220' }] },
    },
    bbox: [-38.7, 44.4, -38.3, 44.6],
    totalWeight: 204_118.5,
    rawFileKept: false,
    importedAt: '2026-12-01T09:01:00.000Z',
    ...overrides,
  });
}

/**
 * The preview of a file whose coordinate headers the detection cannot read (x_coord / y_coord), with a guess only for the weight.
 * @param overrides fields to set
 * @returns the preview
 * @example createCustomerFilePreview({ detected: { lon: 'x_coord', lat: 'y_coord', delimiter: ',', decimalComma: false, encoding: 'utf-8' } })
 */
export function createCustomerFilePreview(overrides: Partial<CustomerFilePreview> = {}): CustomerFilePreview {
  return {
    columns: ['member_name', 'x_coord', 'y_coord', 'spend_eur'],
    rows: [
      ['Ada Fernhollow', '-38.512', '44.503', '1250.50'],
      ['Bram Quaylock', '-38.498', '44.511', '310.00'],
    ],
    detected: { lon: 'y_coord', lat: 'x_coord', weight: 'spend_eur', delimiter: ',', decimalComma: false, encoding: 'utf-8', hasHeader: true },
    ...overrides,
  };
}
