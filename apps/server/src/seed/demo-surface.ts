import type { EntityManager } from '@mikro-orm/sqlite';
import { surfaceCreateSchema } from '../modules/surface/surface.schemas.js';
import { surfaceCreate } from '../modules/surface/surface.service.js';
import type { User } from '../modules/user/user.entity.js';

/** Name of the demo surface queued on first start. */
export const DEMO_SURFACE_NAME = 'Loyalty spend density, Quillport (demo)';

/**
 * Queues one demand surface on the demo customer file, as the demo analyst would from the form:
 * quartic kernel, normal-reference bandwidth, the data extent, density per km². The surface runner
 * computes it like any other run (credits are reserved from the demo organization's grant).
 * @param em - entity manager (a fork)
 * @param scope - the demo organization and workspace
 * @param analyst - the demo analyst (creator)
 * @param customerFileId - the imported demo customer file
 * @returns the queued run's id
 * @example
 * const surfaceId = await demoSurfaceQueue(em, scope, analyst, fileId);
 */
export async function demoSurfaceQueue(
  em: EntityManager,
  scope: { organizationId: string; workspaceId: string },
  analyst: User,
  customerFileId: string,
): Promise<string> {
  const input = surfaceCreateSchema.parse({
    customerFileId,
    name: DEMO_SURFACE_NAME,
    kernel: 'quartic',
    bandwidth: { mode: 'rule', rule: 'normal-reference' },
    studyArea: { type: 'extent' },
    unit: 'km2',
  });
  const surface = await surfaceCreate(em, scope, analyst, input);
  return surface.id;
}
