import { Migration } from '@mikro-orm/migrations';

/** Billing accounts, the append-only credits ledger, receipts, processed webhook events, invitations. */
export class Migration20261202000000Billing extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      "create table `billing_accounts` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `stripe_customer_id` text null, `stripe_subscription_id` text null, `subscription_item_id` text null, `plan_status` text not null default 'none', `seats_paid` integer not null default 0, `current_period_end` datetime null, `last_purchase_credits` integer null, constraint `billing_accounts_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, primary key (`id`));",
    );
    this.addSql('create unique index `billing_accounts_organization_id_unique` on `billing_accounts` (`organization_id`);');
    this.addSql('create unique index `billing_accounts_stripe_customer_id_unique` on `billing_accounts` (`stripe_customer_id`);');
    this.addSql('create unique index `billing_accounts_stripe_subscription_id_unique` on `billing_accounts` (`stripe_subscription_id`);');

    // Balance = sum(amount); balance_after is the running balance, never negative.
    this.addSql(
      "create table `credit_entries` (`id` integer not null primary key autoincrement, `organization_id` text not null, `kind` text not null, `amount` integer not null, `balance_after` integer not null check (`balance_after` >= 0), `ref` text not null, `details` json not null default '{}', `created_at` datetime not null, constraint `credit_entries_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade);",
    );
    this.addSql('create unique index `credit_entries_organization_id_kind_ref_unique` on `credit_entries` (`organization_id`, `kind`, `ref`);');
    this.addSql('create index `credit_entries_organization_id_ref_index` on `credit_entries` (`organization_id`, `ref`);');

    this.addSql(
      'create table `billing_receipts` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `kind` text not null, `description` text not null, `amount` integer not null, `currency` text not null, `credits` integer null, `seats` integer null, `provider_ref` text not null, constraint `billing_receipts_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, primary key (`id`));',
    );
    this.addSql('create unique index `billing_receipts_provider_ref_unique` on `billing_receipts` (`provider_ref`);');
    this.addSql('create index `billing_receipts_organization_id_index` on `billing_receipts` (`organization_id`);');

    this.addSql('create table `billing_webhook_events` (`id` text not null, `type` text not null, `received_at` datetime not null, primary key (`id`));');

    this.addSql(
      'create table `invitations` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `email` text not null, `role` text not null, `token_hash` text not null, `invited_by_id` text null, `expires_at` datetime not null, `accepted_at` datetime null, `accepted_by_id` text null, `revoked_at` datetime null, constraint `invitations_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, constraint `invitations_invited_by_id_foreign` foreign key(`invited_by_id`) references `users`(`id`) on delete set null on update cascade, constraint `invitations_accepted_by_id_foreign` foreign key(`accepted_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql('create unique index `invitations_token_hash_unique` on `invitations` (`token_hash`);');
    this.addSql('create index `invitations_organization_id_index` on `invitations` (`organization_id`);');
  }

  override async down(): Promise<void> {
    for (const table of ['invitations', 'billing_webhook_events', 'billing_receipts', 'credit_entries', 'billing_accounts']) {
      this.addSql(`drop table if exists \`${table}\`;`);
    }
  }
}
