import { z } from 'zod';

const envSchema = z.object({
  /** Origin of the API when it is not the page's own origin (empty: same origin, the production set-up). */
  VITE_API_ORIGIN: z
    .union([z.literal(''), z.url({ protocol: /^https?$/, message: 'must be an absolute http(s) URL such as http://localhost:3000, or empty' })])
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
