import { Router } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import type Stripe from 'stripe';
import type { AppConfig } from '../../config.js';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import { billingCheckout, billingOverview, billingReceipts, billingSeatsChange } from './billing.service.js';
import { checkoutSchema, ledgerQuerySchema, seatsChangeSchema } from './billing.schemas.js';
import { creditsLedger } from './credits.service.js';
import { billingEnabledAssert } from './stripe-client.js';

/**
 * `/api/organizations/:orgId/billing` (owners): overview, checkout, seat changes, ledger, receipts.
 * @param deps - entity manager, SDK client, billing config, public URL
 * @returns the router (mount with the `:orgId` parameter in the path)
 * @example
 * app.use('/api/organizations/:orgId/billing', billingRoutes({ em, stripe, billing: config.billing, publicUrl }));
 */
export function billingRoutes(deps: { em: EntityManager; stripe: Stripe; billing: AppConfig['billing']; publicUrl: string }): Router {
  const { em, stripe } = deps;
  const router = Router({ mergeParams: true });
  router.use(requireMembership(em, PERMISSIONS['billing.manage']));

  router.get('/', async (req, res) => {
    res.json(await billingOverview(em, req.membership!.organization.id));
  });

  router.post('/checkout', async (req, res) => {
    billingEnabledAssert(deps.billing);
    const input = inputParse(checkoutSchema, req.body);
    res.status(201).json(await billingCheckout(em, stripe, deps.publicUrl, req.membership!.organization, sessionUser(req), input));
  });

  router.post('/seats', async (req, res) => {
    billingEnabledAssert(deps.billing);
    const { seats } = inputParse(seatsChangeSchema, req.body);
    res.json(await billingSeatsChange(em, stripe, req.membership!.organization, sessionUser(req), seats));
  });

  router.get('/ledger', async (req, res) => {
    const query = inputParse(ledgerQuerySchema, req.query);
    res.json(await creditsLedger(em, req.membership!.organization.id, query));
  });

  router.get('/receipts', async (req, res) => {
    res.json({ receipts: await billingReceipts(em, req.membership!.organization.id) });
  });
  return router;
}
