import type { StudyArea } from '../types';

type PolygonGeometry = Extract<StudyArea, { type: 'polygon' }>['geometry'];

function isPolygonGeometry(g: unknown): g is PolygonGeometry {
  if (typeof g !== 'object' || g === null) return false;
  const { type, coordinates } = g as { type?: unknown; coordinates?: unknown };
  return (type === 'Polygon' || type === 'MultiPolygon') && Array.isArray(coordinates);
}

function positionsOf(geometry: PolygonGeometry): number[][] {
  return geometry.type === 'Polygon' ? geometry.coordinates.flat() : geometry.coordinates.flat(2);
}

/**
 * Reads a study area from the text of a GeoJSON file: a Polygon or MultiPolygon geometry, a Feature
 * holding one, or a FeatureCollection whose polygons are combined into one MultiPolygon. Coordinates
 * must be lon/lat (RFC 7946).
 * @param text the file's contents
 * @returns the geometry
 * @throws Error with a message that says what is wrong and how to fix it
 * @example studyAreaFromGeoJson('{"type":"Polygon","coordinates":[[[-38.6,44.4],[-38.4,44.4],[-38.4,44.6],[-38.6,44.4]]]}')
 */
export function studyAreaFromGeoJson(text: string): PolygonGeometry {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    throw new Error('The file is not valid JSON. Export the study area as GeoJSON (.geojson) and try again.');
  }
  const candidates: unknown[] = [];
  const kind = (parsed as { type?: unknown } | null)?.type;
  if (kind === 'FeatureCollection') {
    for (const f of (parsed as { features?: unknown[] }).features ?? []) candidates.push((f as { geometry?: unknown })?.geometry);
  } else if (kind === 'Feature') candidates.push((parsed as { geometry?: unknown }).geometry);
  else candidates.push(parsed);

  const polygons = candidates.filter(isPolygonGeometry);
  if (polygons.length === 0) {
    throw new Error('The file holds no Polygon or MultiPolygon. Draw the study area as a polygon (not lines or points) and export it as GeoJSON.');
  }
  const geometry: PolygonGeometry =
    polygons.length === 1
      ? polygons[0]!
      : { type: 'MultiPolygon', coordinates: polygons.flatMap((p) => (p.type === 'Polygon' ? [p.coordinates] : p.coordinates)) };

  for (const position of positionsOf(geometry)) {
    const [lon, lat] = position;
    if (typeof lon !== 'number' || typeof lat !== 'number' || Math.abs(lon) > 180 || Math.abs(lat) > 90) {
      throw new Error(
        `The polygon has a position [${String(lon)}, ${String(lat)}] that is not longitude/latitude in degrees. Save the GeoJSON in WGS 84 (EPSG:4326), as the GeoJSON standard requires.`,
      );
    }
  }
  return geometry;
}
