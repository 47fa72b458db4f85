import type { ScoringRunJson } from '../scoring/scoring.types.js';
import { ringLabel } from './report-labels.js';
import { runResultsRequire, runStabilityBySite } from './report-model.js';

type Properties = Record<string, string | number | boolean | null>;

/** A GeoJSON FeatureCollection of points (RFC 7946). */
export interface SitesFeatureCollection {
  type: 'FeatureCollection';
  features: Array<{
    type: 'Feature';
    id: string;
    geometry: { type: 'Point'; coordinates: [number, number] };
    properties: Properties;
  }>;
}

const deg = (x: number) => Number(x.toFixed(6));
const ringKey = (label: string) => `ring_${label.replace(/ /g, '_')}`;

/**
 * Every site of a scoring run as a GeoJSON FeatureCollection (RFC 7946: WGS84 [lon, lat] with 6
 * decimals, about 0.1 m; no `crs` member). All kinds carry siteId, name, kind, attractiveness and
 * its label; candidates add rank, the measure's value, captured, cannibalization, net new, share of
 * total demand, one `ring_<radius>_<unit>` property per ring, the rank range across bandwidths
 * (when computed) and the explanation; own stores add the demand they hold today. Flat properties,
 * so GIS tools read them as columns. Sites and aggregates only — never customer points.
 * @param run - a succeeded scoring run
 * @returns the feature collection
 * @throws AppError 409 RUN_NOT_READY when the run has no results
 * @example
 * res.send(JSON.stringify(reportSitesGeojson(run)));
 */
export function reportSitesGeojson(run: ScoringRunJson): SitesFeatureCollection {
  const results = runResultsRequire(run);
  const scores = new Map(results.candidates.map((c) => [c.siteId, c]));
  const today = new Map(results.ownToday.map((o) => [o.siteId, o.demand]));
  const stability = runStabilityBySite(run);
  return {
    type: 'FeatureCollection',
    features: run.sites.map((site) => {
      const properties: Properties = {
        siteId: site.siteId,
        name: site.name,
        kind: site.kind,
        attractiveness: site.attractiveness,
        attractivenessLabel: site.attractivenessLabel,
      };
      const c = scores.get(site.siteId);
      if (c) {
        Object.assign(properties, {
          rank: c.rank,
          measure: run.settings.measure,
          value: c.value,
          captured: c.captured,
          cannibalization: c.cannibalization,
          netNew: c.netNew,
          shareOfTotal: c.shareOfTotal,
        });
        c.rings.forEach(
          (r, k) => (properties[ringKey(ringLabel(run.settings, k, r.radiusM))] = r.demand),
        );
        const range = stability.get(site.siteId);
        properties.minRank = range?.minRank ?? null;
        properties.maxRank = range?.maxRank ?? null;
        properties.explanation = c.explanation;
      }
      if (site.kind === 'own') properties.demandToday = today.get(site.siteId) ?? null;
      properties.weightLabel = run.weightLabel;
      return {
        type: 'Feature',
        id: site.siteId,
        geometry: { type: 'Point', coordinates: [deg(site.lon), deg(site.lat)] },
        properties,
      };
    }),
  };
}
