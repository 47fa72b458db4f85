import type { EntityManager } from '@mikro-orm/sqlite';
import { creditsCharge, creditsRelease, creditsReserve } from '../billing/credits.service.js';
import type { Surface } from './surface.entity.js';

// Where a run meets the credits ledger: reserved when a run is queued (and again on retry, under a
// new ref, since a ref holds one reservation), charged when it succeeds, released when it fails,
// is cancelled, deleted, or lost to restarts. Callers pass the entity manager of the transaction
// that changes the run's status, so the ledger and the run never disagree.

/**
 * Reserves a queued run's credits under a fresh ref (stored on the run).
 * @param em entity manager of the queueing transaction
 * @param surface the run (costCredits set)
 * @returns nothing
 * @throws InsufficientCreditsError (402) when the balance does not cover the run
 * @example
 * await surfaceCreditsReserve(em, surface);
 */
export async function surfaceCreditsReserve(em: EntityManager, surface: Surface): Promise<void> {
  surface.creditRef = `surface:${surface.id}:${Date.now().toString(36)}`;
  await creditsReserve(em, surface.organization.id, surface.costCredits, surface.creditRef);
}

/**
 * Turns a succeeded run's reservation into a charge.
 * @param em entity manager of the finishing transaction
 * @param surface the run
 * @returns nothing
 * @example
 * await surfaceCreditsCharge(em, surface);
 */
export async function surfaceCreditsCharge(em: EntityManager, surface: Surface): Promise<void> {
  if (surface.creditRef) await creditsCharge(em, surface.organization.id, surface.creditRef);
}

/**
 * Releases the reservation of a failed, cancelled or deleted run (safe to call twice).
 * @param em entity manager of the unit of work that ends the run
 * @param surface the run
 * @returns nothing
 * @example
 * await surfaceCreditsRelease(em, surface);
 */
export async function surfaceCreditsRelease(em: EntityManager, surface: Surface): Promise<void> {
  if (surface.creditRef) await creditsRelease(em, surface.organization.id, surface.creditRef);
}
