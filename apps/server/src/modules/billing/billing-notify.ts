import type { EntityManager } from '@mikro-orm/sqlite';
import type { Logger } from 'pino';
import type { Mailer } from '../mail/mailer.js';
import { MembershipSchema } from '../organization/membership.entity.js';
import { OrganizationSchema } from '../organization/organization.entity.js';
import { billingPageUrl } from './billing.service.js';
import { DEMO_CREDITS } from './billing-plans.js';
import { lowBalanceMail, ownerEmails } from './billing-mails.js';
import { creditsGrant, type LowBalanceNotifier } from './credits.service.js';
import { billingAccountOf } from './seats.service.js';

/**
 * The low-balance notifier the app registers: e-mails every owner once the balance crosses the threshold.
 * @param em - the ORM's root entity manager (forked per notice)
 * @param mailer - mailer
 * @param publicUrl - app address for the billing link
 * @param log - logger for failures
 * @returns the notifier
 * @example
 * creditsLowBalanceNotifierSet(orm.em, lowBalanceNotifierCreate(orm.em, mailer, publicUrl, log));
 */
export function lowBalanceNotifierCreate(em: EntityManager, mailer: Mailer, publicUrl: string, log: Logger): LowBalanceNotifier {
  return (organizationId, balance, threshold) => {
    void (async () => {
      const fork = em.fork();
      const org = await fork.findOne(OrganizationSchema, organizationId);
      if (!org) return;
      for (const to of await ownerEmails(fork, organizationId)) {
        await mailer.send(lowBalanceMail(to, org.name, balance, threshold, billingPageUrl(publicUrl, organizationId)));
      }
    })().catch((err: unknown) => log.warn({ err, organizationId }, 'low-balance e-mail failed'));
  };
}

/**
 * Gives the seeded demo organization a seat plan (status `demo`, seats = members, not billed) and
 * DEMO_CREDITS credits (grant `demo-seed`). Idempotent.
 * @param em - entity manager
 * @param organizationId - the demo organization
 * @returns nothing
 * @example
 * await billingDemoSetup(em, org.id);
 */
export async function billingDemoSetup(em: EntityManager, organizationId: string): Promise<void> {
  const account = await billingAccountOf(em, organizationId);
  const members = await em.count(MembershipSchema, { organization: organizationId });
  if (account.planStatus === 'none') account.planStatus = 'demo';
  if (account.planStatus === 'demo') account.seatsPaid = Math.max(account.seatsPaid, members);
  await em.flush();
  await creditsGrant(em, organizationId, DEMO_CREDITS, 'demo-seed', 'Demo credits');
}
