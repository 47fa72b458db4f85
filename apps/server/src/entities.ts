import { AuditEventSchema } from './modules/audit/audit-event.entity.js';
import { AuthTokenSchema } from './modules/auth/auth-token.entity.js';
import { BillingAccountSchema } from './modules/billing/billing-account.entity.js';
import { BillingReceiptSchema, BillingWebhookEventSchema } from './modules/billing/billing-receipt.entity.js';
import { CreditEntrySchema } from './modules/billing/credit-entry.entity.js';
import { InvitationSchema } from './modules/invitation/invitation.entity.js';
import { CustomerFileSchema } from './modules/customer-file/customer-file.entity.js';
import { CustomerPointChunkSchema } from './modules/customer-file/customer-point-chunk.entity.js';
import { MembershipSchema } from './modules/organization/membership.entity.js';
import { OrganizationSchema } from './modules/organization/organization.entity.js';
import { SiteSchema } from './modules/site/site.entity.js';
import { ScoringRunSchema } from './modules/scoring/scoring-run.entity.js';
import { ScoringSettingsSchema } from './modules/scoring/scoring-settings.entity.js';
import { SessionSchema } from './modules/session/session.entity.js';
import { ShortlistSchema, ShortlistVersionSchema } from './modules/shortlist/shortlist.entity.js';
import { SurfaceRasterSchema, SurfaceSchema } from './modules/surface/surface.entity.js';
import { UserSchema } from './modules/user/user.entity.js';
import { WorkspaceSchema } from './modules/workspace/workspace.entity.js';

/** Every entity schema; new modules add theirs here (and a migration in src/migrations). */
export const entities = [UserSchema, OrganizationSchema, MembershipSchema, WorkspaceSchema, AuditEventSchema, SessionSchema, AuthTokenSchema, CustomerFileSchema, CustomerPointChunkSchema, BillingAccountSchema, CreditEntrySchema, BillingReceiptSchema, BillingWebhookEventSchema, InvitationSchema, SurfaceSchema, SurfaceRasterSchema, SiteSchema, ScoringSettingsSchema, ScoringRunSchema, ShortlistSchema, ShortlistVersionSchema];
