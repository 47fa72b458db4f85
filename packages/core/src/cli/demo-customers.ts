import { randomSeeded } from '../lib/random-seeded.js';

/**
 * Centre of the invented city of Quillport: lon −38.5°, lat 44.5°. This is open ocean in the
 * middle of the North Atlantic — about 800 km north-west of the westernmost Azores island
 * (Flores, ≈ −31.2°, 39.4°), about 1,100 km east of Newfoundland and west of the Mid-Atlantic
 * Ridge, where the sea floor is abyssal plain some 4 km deep — so no real town, street or
 * business can be read into the demo. It lies in UTM zone 24N (central meridian −39°).
 */
export const QUILLPORT_CENTRE = { lon: -38.5, lat: 44.5 } as const;

/** Invented districts of Quillport: offset from the centre (km east, km north), spread (km), share of customers. */
const DISTRICTS = [
  { name: 'Harbour Steps', east: 0.4, north: -1.2, sd: 1.1, share: 0.22 },
  { name: 'Old Ropewalk', east: -3.1, north: 0.8, sd: 1.6, share: 0.18 },
  { name: 'Saltmarsh Rise', east: 4.2, north: 2.6, sd: 2.2, share: 0.16 },
  { name: 'Lantern Quay', east: 1.8, north: -4.3, sd: 0.9, share: 0.1 },
  { name: 'Gullwing Heights', east: -5.6, north: 5.1, sd: 2.8, share: 0.12 },
  { name: 'Tidewater Fields', east: 7.9, north: -2.2, sd: 3.1, share: 0.1 },
] as const;

/** Metres per degree of latitude on the mean sphere (2π·6371.0088 km / 360). */
const M_PER_DEG = 111_195;

/** Invented Larchloaf loyalty-card customers: WGS84 degrees and annual spend in the weight. */
export interface DemoCustomers {
  lon: Float64Array;
  lat: Float64Array;
  /** Annual spend per customer (invented currency units). */
  w: Float64Array;
}

/**
 * Generates the Larchloaf demo customers: clustered around Quillport's invented districts with a
 * thin scatter across the city, annual spend log-normal around 180. Seeded: the same every run.
 *
 * @param n number of customers
 * @param seed generator seed
 * @returns customers in lon/lat degrees with spend
 * @example
 * const { lon, lat, w } = demoCustomers(30_000);
 */
export function demoCustomers(n: number, seed = 1604): DemoCustomers {
  const rng = randomSeeded(seed);
  const lon = new Float64Array(n);
  const lat = new Float64Array(n);
  const w = new Float64Array(n);
  const mPerDegLon = M_PER_DEG * Math.cos((QUILLPORT_CENTRE.lat * Math.PI) / 180);
  for (let k = 0; k < n; k++) {
    let east: number;
    let north: number;
    let u = rng.uniform();
    const d = DISTRICTS.find((c) => (u -= c.share) < 0);
    if (d) {
      east = d.east + d.sd * rng.normal();
      north = d.north + d.sd * rng.normal();
    } else {
      east = -10 + 22 * rng.uniform();
      north = -8 + 16 * rng.uniform();
    }
    lon[k] = QUILLPORT_CENTRE.lon + (east * 1000) / mPerDegLon;
    lat[k] = QUILLPORT_CENTRE.lat + (north * 1000) / M_PER_DEG;
    w[k] = Math.round(180 * Math.exp(0.6 * rng.normal()) * 100) / 100;
  }
  return { lon, lat, w };
}
