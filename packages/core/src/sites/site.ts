import { CoreError } from '../errors.js';

/** What a site is to the chain: a place under test, one of its stores, or a rival's store. */
export type SiteKind = 'candidate' | 'own' | 'competitor';

export const SITE_KINDS: readonly SiteKind[] = ['candidate', 'own', 'competitor'];

/**
 * A site in the demand surface's planar projection. `x`, `y` are metres (same EPSG / proj4 as
 * the surface); `attractiveness` is the Huff model's A_j (e.g. selling space), > 0, any unit as
 * long as all sites of a study use the same one.
 */
export interface Site {
  id: string;
  kind: SiteKind;
  x: number;
  y: number;
  attractiveness: number;
}

function siteLabel(site: { id?: unknown }, index: number): string {
  return typeof site.id === 'string' && site.id !== '' ? `site "${site.id}"` : `site #${index + 1}`;
}

/**
 * Checks one site and throws INVALID_ARGUMENT naming the site and the rule it breaks.
 *
 * @param site the site to check
 * @param index its position in the list, used when the id itself is missing
 * @returns the same site, typed
 * @example
 * siteValidate({ id: 'c1', kind: 'candidate', x: 500, y: 800, attractiveness: 1 });
 */
export function siteValidate(site: Site, index = 0): Site {
  const label = siteLabel(site, index);
  if (typeof site.id !== 'string' || site.id.trim() === '') {
    throw new CoreError('INVALID_ARGUMENT', `${label} needs a non-empty text id`, 'sites.id', { index });
  }
  if (!SITE_KINDS.includes(site.kind)) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `${label} has kind ${JSON.stringify(site.kind)}; use one of ${SITE_KINDS.join(', ')}`,
      'sites.kind',
      { id: site.id },
    );
  }
  for (const axis of ['x', 'y'] as const) {
    if (typeof site[axis] !== 'number' || !Number.isFinite(site[axis])) {
      throw new CoreError(
        'INVALID_ARGUMENT',
        `${label} has ${axis} = ${String(site[axis])}; give planar metres in the surface's projection`,
        `sites.${axis}`,
        { id: site.id },
      );
    }
  }
  if (typeof site.attractiveness !== 'number' || !(site.attractiveness > 0) || !Number.isFinite(site.attractiveness)) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `${label} has attractiveness ${String(site.attractiveness)}; it must be a positive finite number (e.g. selling space)`,
      'sites.attractiveness',
      { id: site.id },
    );
  }
  return site;
}

/**
 * Checks a list of sites: each site by {@link siteValidate}, and ids unique.
 *
 * @param sites the sites
 * @returns the same list
 * @example
 * sitesValidate([{ id: 'own-1', kind: 'own', x: 0, y: 0, attractiveness: 2 }]);
 */
export function sitesValidate(sites: readonly Site[]): readonly Site[] {
  if (!Array.isArray(sites)) {
    throw new CoreError('INVALID_ARGUMENT', 'sites must be an array of sites', 'sites');
  }
  const seen = new Set<string>();
  sites.forEach((s, i) => {
    siteValidate(s, i);
    if (seen.has(s.id)) {
      throw new CoreError('INVALID_ARGUMENT', `site "${s.id}" appears twice; give every site its own id`, 'sites.id', {
        id: s.id,
      });
    }
    seen.add(s.id);
  });
  return sites;
}
