import { QUILLPORT_CENTRE, type SiteKind } from '@demandscape/core';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../modules/audit/audit.service.js';
import { SiteSchema } from '../modules/site/site.entity.js';
import { siteAdd } from '../modules/site/site.service.js';
import type { User } from '../modules/user/user.entity.js';

/** Unit of every demo site's attractiveness. */
export const DEMO_SITE_LABEL = 'sales floor m²';

/** An invented demo site: offset from Quillport's centre in km (east, north), sales floor m², one-line note. */
interface DemoSite {
  kind: SiteKind;
  name: string;
  east: number;
  north: number;
  floor: number;
  notes: string;
}

/**
 * Larchloaf's six cafés, eight candidate sites along the north corridor and nine stores of three
 * invented competitor chains (Brindlecrust, Kettlewhistle Coffee, Ovenwren Bakehouse). All invented;
 * placed on land on the demo basemap, near the demo customer districts (`demo-customers.ts`).
 */
export const DEMO_SITES: readonly DemoSite[] = [
  { kind: 'own', name: 'Larchloaf Harbour Steps', east: 0.6, north: -1.0, floor: 210, notes: 'Flagship café and bakery counter; busiest store, open since 2014.' },
  { kind: 'own', name: 'Larchloaf Ropewalk Arcade', east: -3.3, north: 0.6, floor: 160, notes: 'Inside the covered arcade; strong weekday breakfast trade.' },
  { kind: 'own', name: 'Larchloaf Saltmarsh Green', east: 4.0, north: 2.3, floor: 145, notes: 'Corner unit on the green; lease renews in 2029.' },
  { kind: 'own', name: 'Larchloaf Lantern Quay', east: 1.9, north: -4.0, floor: 120, notes: 'Small quayside café; seasonal peak with the ferry traffic.' },
  { kind: 'own', name: 'Larchloaf Gullwing Market', east: -5.2, north: 4.6, floor: 175, notes: 'Next to the Saturday market; largest seating area.' },
  { kind: 'own', name: 'Larchloaf Tidewater Mill', east: 7.4, north: -2.0, floor: 130, notes: 'Converted mill building; parking for 20 cars.' },
  { kind: 'candidate', name: 'Ferrywright Row', east: -1.5, north: 3.2, floor: 150, notes: 'Former chandlery, ground floor; landlord offers a rent-free first quarter.' },
  { kind: 'candidate', name: "Chandlers' Yard", east: 1.0, north: 2.4, floor: 185, notes: 'New courtyard scheme; fit-out ready by spring.' },
  { kind: 'candidate', name: 'Gullwing Terrace', east: -4.2, north: 6.3, floor: 110, notes: 'End of terrace with a south-facing forecourt for tables.' },
  { kind: 'candidate', name: 'Saltmarsh Station', east: 5.6, north: 4.1, floor: 125, notes: 'Kiosk-sized unit in the tram station concourse.' },
  { kind: 'candidate', name: 'Old Tannery Corner', east: -2.4, north: 4.6, floor: 200, notes: 'Large corner plot; needs a change-of-use consent.' },
  { kind: 'candidate', name: 'Beacon Hill Parade', east: 2.6, north: 5.2, floor: 140, notes: 'Parade of six shops; two neighbours are vacant.' },
  { kind: 'candidate', name: 'Millrace Crossing', east: -6.8, north: 3.4, floor: 95, notes: 'Beside the river footbridge; limited delivery access.' },
  { kind: 'candidate', name: 'Northgate Market Hall', east: -0.3, north: 6.4, floor: 170, notes: 'Stall-plus-seating inside the refurbished market hall.' },
  { kind: 'competitor', name: 'Brindlecrust Harbour', east: -0.6, north: -2.0, floor: 180, notes: 'Brindlecrust: bakery chain, strong on bread, few seats.' },
  { kind: 'competitor', name: 'Brindlecrust Saltmarsh', east: 3.0, north: 1.0, floor: 150, notes: 'Brindlecrust: opened last year with a drive-through hatch.' },
  { kind: 'competitor', name: 'Brindlecrust Gullwing', east: -6.0, north: 6.5, floor: 120, notes: 'Brindlecrust: small shop, morning trade only.' },
  { kind: 'competitor', name: 'Kettlewhistle Lantern Quay', east: 1.2, north: -3.6, floor: 90, notes: 'Kettlewhistle Coffee: coffee bar with a short pastry menu.' },
  { kind: 'competitor', name: 'Kettlewhistle Ropewalk', east: -2.0, north: 1.9, floor: 75, notes: 'Kettlewhistle Coffee: takeaway window, very quick service.' },
  { kind: 'competitor', name: 'Kettlewhistle Station Square', east: 6.2, north: 3.2, floor: 110, notes: 'Kettlewhistle Coffee: commuter trade by the tram stop.' },
  { kind: 'competitor', name: 'Ovenwren Bakehouse Old Town', east: -1.4, north: -0.8, floor: 240, notes: 'Ovenwren Bakehouse: large café-restaurant, weekend brunch queues.' },
  { kind: 'competitor', name: 'Ovenwren Bakehouse Tidewater', east: 9.0, north: -3.5, floor: 200, notes: 'Ovenwren Bakehouse: retail-park unit with its own car park.' },
  { kind: 'competitor', name: 'Ovenwren Bakehouse Heights', east: -4.4, north: 3.0, floor: 160, notes: 'Ovenwren Bakehouse: family café with a play corner.' },
];

/** Metres per degree of latitude on the mean sphere (2π·6371.0088 km / 360), as in the demo customer generator. */
const M_PER_DEG = 111_195;

/**
 * WGS84 degrees of a demo site, with the same local conversion as the demo customer generator.
 * @param site - offset from Quillport's centre in km
 * @returns lon and lat, rounded to 5 decimals (about 1 m)
 * @example
 * demoSiteLonLat({ east: 0, north: 0 }); // { lon: -38.5, lat: 44.5 }
 */
export function demoSiteLonLat(site: { east: number; north: number }): { lon: number; lat: number } {
  const mPerDegLon = M_PER_DEG * Math.cos((QUILLPORT_CENTRE.lat * Math.PI) / 180);
  const round = (v: number) => Math.round(v * 1e5) / 1e5;
  return { lon: round(QUILLPORT_CENTRE.lon + (site.east * 1000) / mPerDegLon), lat: round(QUILLPORT_CENTRE.lat + (site.north * 1000) / M_PER_DEG) };
}

/**
 * Adds the invented demo sites to the demo workspace as the demo planner, when the workspace has no
 * site yet (idempotent), and records one `site.import` audit event.
 * @param em - entity manager (a fork)
 * @param scope - the demo organization and workspace
 * @param planner - the demo planner (creator)
 * @returns how many sites were added (0 when the workspace already had sites)
 * @example
 * const added = await demoSitesSeed(em, { organizationId, workspaceId }, planner);
 */
export async function demoSitesSeed(em: EntityManager, scope: { organizationId: string; workspaceId: string }, planner: User): Promise<number> {
  if ((await em.count(SiteSchema, { workspace: scope.workspaceId })) > 0) return 0;
  for (const s of DEMO_SITES) {
    siteAdd(em, scope, planner, { kind: s.kind, name: s.name, ...demoSiteLonLat(s), attractiveness: s.floor, attractivenessLabel: DEMO_SITE_LABEL, notes: s.notes });
  }
  auditRecord(em, { action: 'site.import', organizationId: scope.organizationId, actor: planner, target: { type: 'workspace', id: scope.workspaceId }, details: { count: DEMO_SITES.length, format: 'demo' } });
  await em.flush();
  return DEMO_SITES.length;
}
