/**
 * The invented city of Quillport as GeoJSON layers for the offline demo basemap: an island coastline
 * with a bay on its south side, a river running into the bay, named district polygons and main roads.
 * Pure and seeded: the same input gives the same file, byte for byte. No real place is drawn.
 */

/** Quillport's centre (open North Atlantic), the same as the demo customer generator's `QUILLPORT_CENTRE`. */
export const QUILLPORT_CENTRE = { lon: -38.5, lat: 44.5 } as const;

/** The demo customer generator's districts: centre offset in km (east, north) and spread (km). */
export const QUILLPORT_DISTRICTS = [
  { name: 'Harbour Steps', east: 0.4, north: -1.2, sd: 1.1 },
  { name: 'Old Ropewalk', east: -3.1, north: 0.8, sd: 1.6 },
  { name: 'Saltmarsh Rise', east: 4.2, north: 2.6, sd: 2.2 },
  { name: 'Lantern Quay', east: 1.8, north: -4.3, sd: 0.9 },
  { name: 'Gullwing Heights', east: -5.6, north: 5.1, sd: 2.8 },
  { name: 'Tidewater Fields', east: 7.9, north: -2.2, sd: 3.1 },
] as const;

/** Metres per degree of latitude on the mean sphere (2π·6371.0088 km / 360), as in the demo generator. */
const M_PER_DEG = 111_195;

type Km = [east: number, north: number];
type Position = [lon: number, lat: number];

export type BasemapLayer = 'land' | 'district' | 'river' | 'road' | 'district-label' | 'water-label';
export type BasemapFeature = {
  type: 'Feature';
  properties: { layer: BasemapLayer; name?: string; kind?: string };
  geometry: { type: 'Polygon'; coordinates: Position[][] } | { type: 'LineString'; coordinates: Position[] } | { type: 'Point'; coordinates: Position };
};
export type Basemap = { type: 'FeatureCollection'; name: string; features: BasemapFeature[] };

/** mulberry32: a small seeded generator (public domain), enough for shapes. */
function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function lonLat([east, north]: Km): Position {
  const mPerDegLon = M_PER_DEG * Math.cos((QUILLPORT_CENTRE.lat * Math.PI) / 180);
  // Six decimals ≈ 0.1 m: plenty for a basemap and keeps the file small and stable.
  const round = (v: number) => Math.round(v * 1e6) / 1e6;
  return [round(QUILLPORT_CENTRE.lon + (east * 1000) / mPerDegLon), round(QUILLPORT_CENTRE.lat + (north * 1000) / M_PER_DEG)];
}

function closed(ring: Km[]): Km[] {
  return [...ring, ring[0]];
}

/** Coastline: a wobbly island around (0.5, 1.5) km, ~29 km east–west and ~22 km north–south, with a bay pushed in from the south towards Lantern Quay. */
function coastline(random: () => number): Km[] {
  const waves = Array.from({ length: 6 }, (_, k) => ({ amp: (0.7 * random()) / (k + 1) ** 0.6, phase: random() * 2 * Math.PI, freq: k + 2 }));
  const ring: Km[] = [];
  const steps = 240;
  for (let i = 0; i < steps; i++) {
    const theta = (2 * Math.PI * i) / steps;
    let r = 12.5 + waves.reduce((sum, w) => sum + w.amp * Math.sin(w.freq * theta + w.phase), 0);
    // The bay: centred due south (θ = 270°), ~40° wide, its head about 5.5 km south of the centre.
    const d = Math.atan2(Math.sin(theta - 1.5 * Math.PI), Math.cos(theta - 1.5 * Math.PI));
    r -= 5.2 * Math.exp(-((d / 0.32) ** 2));
    // Flatter to the east–west, like a long island.
    ring.push([0.5 + 1.15 * r * Math.cos(theta), 1.5 + 0.9 * r * Math.sin(theta)]);
  }
  return ring;
}

/** Sutherland–Hodgman: clips any simple polygon by a convex polygon (both counter-clockwise, open rings). */
function polygonClip(subject: Km[], clip: Km[]): Km[] {
  let output = subject;
  for (let i = 0; i < clip.length && output.length > 0; i++) {
    const a = clip[i];
    const b = clip[(i + 1) % clip.length];
    const inside = (p: Km) => (b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]) >= 0;
    const cross = (p: Km, q: Km): Km => {
      const a1 = b[1] - a[1];
      const b1 = a[0] - b[0];
      const c1 = a1 * a[0] + b1 * a[1];
      const a2 = q[1] - p[1];
      const b2 = p[0] - q[0];
      const c2 = a2 * p[0] + b2 * p[1];
      const det = a1 * b2 - a2 * b1;
      return [(b2 * c1 - b1 * c2) / det, (a1 * c2 - a2 * c1) / det];
    };
    const input = output;
    output = [];
    for (let j = 0; j < input.length; j++) {
      const p = input[j];
      const q = input[(j + 1) % input.length];
      if (inside(q)) {
        if (!inside(p)) output.push(cross(p, q));
        output.push(q);
      } else if (inside(p)) output.push(cross(p, q));
    }
  }
  return output;
}

/** A district: the land nearer its centre than any other (Voronoi cell), within a few spreads of it. */
function districtShape(index: number, land: Km[]): Km[] {
  const site = QUILLPORT_DISTRICTS[index];
  const reach = 1.6 * site.sd + 1.4;
  let cell: Km[] = Array.from({ length: 48 }, (_, k) => {
    const t = (2 * Math.PI * k) / 48;
    return [site.east + reach * Math.cos(t), site.north + reach * Math.sin(t)] as Km;
  });
  QUILLPORT_DISTRICTS.forEach((other, j) => {
    if (j === index) return;
    // Half-plane of points nearer `site` than `other`, as a big counter-clockwise rectangle.
    const mx = (site.east + other.east) / 2;
    const my = (site.north + other.north) / 2;
    const nx = site.east - other.east;
    const ny = site.north - other.north;
    const len = Math.hypot(nx, ny);
    const [ux, uy] = [nx / len, ny / len];
    // Tangent chosen so the near side lies to the left of A→B (counter-clockwise rectangle).
    const [tx, ty] = [uy, -ux];
    const big = 100;
    cell = polygonClip(cell, [
      [mx - tx * big, my - ty * big],
      [mx + tx * big, my + ty * big],
      [mx + tx * big + ux * big, my + ty * big + uy * big],
      [mx - tx * big + ux * big, my - ty * big + uy * big],
    ]);
  });
  // Land is the subject (it may be concave), the district cell the convex clip.
  return polygonClip(land, cell);
}

/** A seeded meander between two points: a polyline with sideways offsets that fade at both ends. */
function meander(random: () => number, from: Km, to: Km, segments: number, wiggle: number): Km[] {
  const [dx, dy] = [to[0] - from[0], to[1] - from[1]];
  const len = Math.hypot(dx, dy);
  const [nx, ny] = [-dy / len, dx / len];
  const phase = random() * 2 * Math.PI;
  const points: Km[] = [];
  for (let i = 0; i <= segments; i++) {
    const t = i / segments;
    const side = wiggle * Math.sin(Math.PI * t) * (Math.sin(3 * Math.PI * t + phase) + 0.15 * (random() - 0.5));
    points.push([from[0] + dx * t + nx * side, from[1] + dy * t + ny * side]);
  }
  return points;
}

const ROAD_LINKS: Array<[string, string, string]> = [
  ['Lantern Quay', 'Harbour Steps', 'main'],
  ['Harbour Steps', 'Old Ropewalk', 'main'],
  ['Old Ropewalk', 'Gullwing Heights', 'main'],
  ['Harbour Steps', 'Saltmarsh Rise', 'main'],
  ['Saltmarsh Rise', 'Tidewater Fields', 'main'],
  ['Lantern Quay', 'Tidewater Fields', 'main'],
  ['Gullwing Heights', 'Saltmarsh Rise', 'secondary'],
  ['Old Ropewalk', 'Lantern Quay', 'secondary'],
];

/**
 * Builds the Quillport basemap.
 * @param seed shape seed (the committed asset uses the default)
 * @returns a GeoJSON FeatureCollection in lon/lat; each feature's `layer` property says how to draw it
 * @example const basemap = quillportBasemap(); basemap.features.filter((f) => f.properties.layer === 'district').length // 6
 */
export function quillportBasemap(seed = 2027): Basemap {
  const random = seededRandom(seed);
  const land = coastline(random);
  const features: BasemapFeature[] = [];
  const polygon = (ring: Km[]) => ({ type: 'Polygon' as const, coordinates: [closed(ring).map(lonLat)] });
  const line = (points: Km[]) => ({ type: 'LineString' as const, coordinates: points.map(lonLat) });

  features.push({ type: 'Feature', properties: { layer: 'land', name: 'Quillport' }, geometry: polygon(land) });
  QUILLPORT_DISTRICTS.forEach((d, i) => {
    features.push({ type: 'Feature', properties: { layer: 'district', name: d.name }, geometry: polygon(districtShape(i, land)) });
  });
  // The river Quill rises in the north-west hills and reaches the bay beside Lantern Quay.
  const river = meander(random, [-8.5, 9], [0.6, -5.2], 60, 1.2);
  features.push({ type: 'Feature', properties: { layer: 'river', name: 'River Quill' }, geometry: line(river) });
  const at = (name: string): Km => {
    const d = QUILLPORT_DISTRICTS.find((x) => x.name === name);
    if (!d) throw new Error(`road link names an unknown district: ${name}`);
    return [d.east, d.north];
  };
  for (const [from, to, kind] of ROAD_LINKS) {
    features.push({ type: 'Feature', properties: { layer: 'road', kind }, geometry: line(meander(random, at(from), at(to), 16, 0.35)) });
  }
  // Coast road round the north shore, about 1.2 km inland.
  // Ring points 6 apart from θ ≈ 8° to 172° (the ring has 240 points starting due east).
  const coastRoad = land
    .filter((_, i) => i % 6 === 0 && i >= 6 && i <= 114)
    .map(([e, n]): Km => [0.5 + (e - 0.5) * 0.9, 1.5 + (n - 1.5) * 0.88])
    .filter(([, n]) => n > 0);
  features.push({ type: 'Feature', properties: { layer: 'road', kind: 'secondary' }, geometry: line(coastRoad) });
  for (const d of QUILLPORT_DISTRICTS) {
    features.push({ type: 'Feature', properties: { layer: 'district-label', name: d.name }, geometry: { type: 'Point', coordinates: lonLat([d.east, d.north]) } });
  }
  features.push({ type: 'Feature', properties: { layer: 'water-label', name: 'Quill Sound' }, geometry: { type: 'Point', coordinates: lonLat([0.8, -7.4]) } });
  return { type: 'FeatureCollection', name: 'Quillport demo basemap (invented)', features };
}
