import { Migration } from '@mikro-orm/migrations';

/** Users, organizations, memberships, workspaces, audit events, sessions and one-use tokens. */
export class Migration20261201000000Initial extends Migration {
  override async up(): Promise<void> {
    this.addSql("create table `organizations` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `name` text not null, `slug` text not null, primary key (`id`));");
    this.addSql('create unique index `organizations_slug_unique` on `organizations` (`slug`);');

    this.addSql('create table `sessions` (`sid` text not null, `data` text not null, `user_id` text null, `expires_at` datetime not null, primary key (`sid`));');
    this.addSql('create index `sessions_user_id_index` on `sessions` (`user_id`);');
    this.addSql('create index `sessions_expires_at_index` on `sessions` (`expires_at`);');

    this.addSql('create table `users` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `email` text not null, `name` text not null, `password_hash` text null, `email_verified_at` datetime null, `google_subject` text null, primary key (`id`));');
    this.addSql('create unique index `users_email_unique` on `users` (`email`);');
    this.addSql('create unique index `users_google_subject_unique` on `users` (`google_subject`);');

    this.addSql('create table `memberships` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `user_id` text not null, `role` text not null, constraint `memberships_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, constraint `memberships_user_id_foreign` foreign key(`user_id`) references `users`(`id`) on delete cascade on update cascade, primary key (`id`));');
    this.addSql('create index `memberships_organization_id_index` on `memberships` (`organization_id`);');
    this.addSql('create index `memberships_user_id_index` on `memberships` (`user_id`);');
    this.addSql('create unique index `memberships_organization_id_user_id_unique` on `memberships` (`organization_id`, `user_id`);');

    this.addSql('create table `auth_tokens` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `user_id` text not null, `purpose` text not null, `token_hash` text not null, `expires_at` datetime not null, `used_at` datetime null, constraint `auth_tokens_user_id_foreign` foreign key(`user_id`) references `users`(`id`) on delete cascade on update cascade, primary key (`id`));');
    this.addSql('create index `auth_tokens_user_id_index` on `auth_tokens` (`user_id`);');
    this.addSql('create unique index `auth_tokens_token_hash_unique` on `auth_tokens` (`token_hash`);');

    this.addSql('create table `audit_events` (`id` integer not null primary key autoincrement, `organization_id` text null, `actor_id` text null, `action` text not null, `target_type` text null, `target_id` text null, `details` json not null, `created_at` datetime not null, constraint `audit_events_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, constraint `audit_events_actor_id_foreign` foreign key(`actor_id`) references `users`(`id`) on delete set null on update cascade);');
    this.addSql('create index `audit_events_organization_id_index` on `audit_events` (`organization_id`);');
    this.addSql('create index `audit_events_actor_id_index` on `audit_events` (`actor_id`);');

    this.addSql("create table `workspaces` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `name` text not null, `description` text not null default '', `created_by_id` text null, constraint `workspaces_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, constraint `workspaces_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));");
    this.addSql('create index `workspaces_organization_id_index` on `workspaces` (`organization_id`);');
    this.addSql('create index `workspaces_created_by_id_index` on `workspaces` (`created_by_id`);');
  }

  override async down(): Promise<void> {
    for (const table of ['workspaces', 'audit_events', 'auth_tokens', 'memberships', 'users', 'sessions', 'organizations']) {
      this.addSql(`drop table if exists \`${table}\`;`);
    }
  }
}
