import { z } from 'zod';

const envSchema = z.object({
  /** Origin of the API when it is not the page's own origin (empty: same origin, the production set-up). */
  VITE_API_ORIGIN: z
    .union([z.literal(''), z.url({ protocol: /^https?$/, message: 'must be an absolute http(s) URL such as http://localhost:3000, or empty' })])
    .default(''),
  /**
   * MapLibre style for the map's basemap in production (a style JSON URL, e.g. a self-hosted tile server's).
   * Empty: the offline demo basemap of the invented city of Quillport that ships with the app.
   */
  VITE_BASEMAP_STYLE_URL: z
    .union([
      z.literal(''),
      z.url({ protocol: /^https?$/, message: 'must be an absolute http(s) URL of a MapLibre style JSON, or empty for the demo basemap' }),
    ])
    .default(''),
});

export type Env = z.infer<typeof envSchema>;

/**
 * Validates the build-time variables and lists every bad one at once.
 * @param source the variables to check (Vite's `import.meta.env`)
 * @returns the typed settings
 * @example envFrom({ VITE_API_ORIGIN: '' }).VITE_API_ORIGIN // ''
 */
export function envFrom(source: Record<string, unknown>): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `- ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid web app environment variables (set them in apps/web/.env):\n${lines.join('\n')}`);
  }
  return result.data;
}

export const env = envFrom(import.meta.env);
