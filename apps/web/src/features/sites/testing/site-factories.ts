import type { Site, SiteImportPreview } from '../types';

/**
 * A site as the API returns it (invented Larchloaf study in invented Quillport); a candidate by default.
 * @param overrides fields to set
 * @returns the site
 * @example createSite({ id: 'site_2', kind: 'own', name: 'Harbour Row' })
 */
export function createSite(overrides: Partial<Site> = {}): Site {
  return {
    id: 'site_1',
    workspaceId: 'wsp_1',
    kind: 'candidate',
    name: 'Quay corner',
    lon: -38.51,
    lat: 44.52,
    attractiveness: 120,
    attractivenessLabel: 'm² sales floor',
    notes: '',
    createdBy: { id: 'usr_planner', name: 'Orrin Castellow' },
    createdAt: '2026-12-02T09:00:00.000Z',
    updatedAt: '2026-12-02T09:00:00.000Z',
    ...overrides,
  };
}

/**
 * The invented study's sites: two candidates, an own store, a competitor.
 * @returns the sites, by kind then name as the API orders them
 * @example server.use(http.get(url, () => HttpResponse.json({ sites: createSiteList() })))
 */
export function createSiteList(): Site[] {
  return [
    createSite({ id: 'site_1', name: 'Quay corner' }),
    createSite({ id: 'site_4', name: 'Lantern Yard', lon: -38.49, lat: 44.5, attractiveness: 95 }),
    createSite({ id: 'site_2', kind: 'own', name: 'Harbour Row', lon: -38.47, lat: 44.49, attractiveness: 180, notes: 'Lease renews in 2028.' }),
    createSite({ id: 'site_3', kind: 'competitor', name: 'Crumbhall Mill Street', lon: -38.45, lat: 44.55, attractiveness: 140 }),
  ];
}

/**
 * The preview of an invented candidates file with a guessed mapping and no attractiveness column.
 * @param overrides fields to set
 * @returns the preview
 * @example createSiteImportPreview({ missing: ['attractiveness'] })
 */
export function createSiteImportPreview(overrides: Partial<SiteImportPreview> = {}): SiteImportPreview {
  return {
    format: 'csv',
    columns: ['Site', 'X', 'Y', 'Type', 'Remarks'],
    sampleRows: [
      ['Gullwing Arcade', '-38.502', '44.511', 'candidate', 'corner unit'],
      ['Saltmarsh Lane', '-38.478', '44.533', 'candidate', ''],
      ['Tidegate Plaza', '-38.530', '44.498', 'candidate', 'near the ferry'],
    ],
    rowCount: 3,
    mapping: { name: 'Site', lon: 'X', lat: 'Y', kind: 'Type', attractiveness: null, attractivenessLabel: null, notes: 'Remarks' },
    missing: ['attractiveness'],
    ...overrides,
  };
}
