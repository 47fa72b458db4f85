import { HUFF_ALPHA_DEFAULT, HUFF_BETA_DEFAULT } from '@demandscape/core';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import type { User } from '../user/user.entity.js';
import { ScoringSettingsSchema, type ScoringSettings } from './scoring-settings.entity.js';
import type { ScoringSettingsInput } from './scoring.schemas.js';
import type { ScoringSettingsJson } from './scoring.types.js';
import { scoringScopeCheck, type ScoringScope } from './scoring-scope.js';

/**
 * Settings of a workspace that has saved none: Huff α = 1, β = 2 (R package MCI defaults; Huff 1963
 * for the model, DOMAIN.md §2), rings of 1, 3 and 5 km, ranked by net new demand, minimum distance
 * half a cell.
 */
export const SCORING_SETTINGS_DEFAULT: Omit<ScoringSettingsJson, 'isDefault' | 'updatedAt' | 'updatedBy'> = {
  alpha: HUFF_ALPHA_DEFAULT,
  beta: HUFF_BETA_DEFAULT,
  radii: [1, 3, 5],
  radiusUnit: 'km',
  measure: 'netNew',
  minDistanceM: null,
};

function settingsJson(row: ScoringSettings | null): ScoringSettingsJson {
  if (!row) return { ...SCORING_SETTINGS_DEFAULT, radii: [...SCORING_SETTINGS_DEFAULT.radii], isDefault: true, updatedAt: null, updatedBy: null };
  return {
    alpha: row.alpha,
    beta: row.beta,
    radii: row.radii,
    radiusUnit: row.radiusUnit,
    measure: row.measure,
    minDistanceM: row.minDistanceM,
    isDefault: false,
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: row.updatedBy ? { id: row.updatedBy.id, name: row.updatedBy.name } : null,
  };
}

/**
 * The workspace's scoring settings (the defaults until a planner saves some).
 * @param em entity manager
 * @param scope organization and workspace
 * @returns the settings
 * @example
 * const { alpha, beta } = await scoringSettingsGet(em, scope);
 */
export async function scoringSettingsGet(em: EntityManager, scope: ScoringScope): Promise<ScoringSettingsJson> {
  await scoringScopeCheck(em, scope);
  const row = await em.findOne(ScoringSettingsSchema, { workspace: scope.workspaceId, organization: scope.organizationId }, { populate: ['updatedBy'] });
  return settingsJson(row);
}

/**
 * Saves the workspace's scoring settings and records `scoring.settings_update`.
 * @param em entity manager
 * @param scope organization and workspace
 * @param actor who saves
 * @param input validated settings
 * @returns the saved settings
 * @example
 * await scoringSettingsSave(em, scope, user, { alpha: 1, beta: 2, radii: [1, 3, 5], radiusUnit: 'km', measure: 'netNew', minDistanceM: null });
 */
export async function scoringSettingsSave(em: EntityManager, scope: ScoringScope, actor: User, input: ScoringSettingsInput): Promise<ScoringSettingsJson> {
  await scoringScopeCheck(em, scope);
  let row = await em.findOne(ScoringSettingsSchema, { workspace: scope.workspaceId, organization: scope.organizationId });
  const fields = {
    alpha: input.alpha,
    beta: input.beta,
    radii: input.radii,
    radiusUnit: input.radiusUnit,
    measure: input.measure as ScoringSettings['measure'],
    minDistanceM: input.minDistanceM,
    updatedBy: em.getReference('User', actor.id) as unknown as User,
  };
  if (row) Object.assign(row, fields);
  else {
    row = em.create(ScoringSettingsSchema, {
      id: entityId(),
      organization: em.getReference('Organization', scope.organizationId),
      workspace: em.getReference('Workspace', scope.workspaceId),
      ...fields,
    } as ScoringSettings);
  }
  auditRecord(em, {
    action: 'scoring.settings_update',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'workspace', id: scope.workspaceId },
    details: { workspaceId: scope.workspaceId, alpha: input.alpha, beta: input.beta, radii: input.radii, radiusUnit: input.radiusUnit, measure: input.measure, minDistanceM: input.minDistanceM },
  });
  await em.flush();
  return scoringSettingsGet(em, scope);
}
