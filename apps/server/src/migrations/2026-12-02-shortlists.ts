import { Migration } from '@mikro-orm/migrations';

/**
 * Shortlists and their versions. A version names its scoring run by id only (no foreign key):
 * its snapshot stays readable after the run is deleted.
 */
export class Migration20261202000400Shortlists extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `shortlists` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `workspace_id` text not null, `name` text not null, `latest_version` integer not null default 1, `item_count` integer not null default 0, `shared_at` datetime null, `shared_with` json not null, `created_by_id` text null, ' +
        'constraint `shortlists_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, ' +
        'constraint `shortlists_workspace_id_foreign` foreign key(`workspace_id`) references `workspaces`(`id`) on delete cascade on update cascade, ' +
        'constraint `shortlists_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql(
      'create index `shortlists_organization_id_updated_at_index` on `shortlists` (`organization_id`, `updated_at`);',
    );
    this.addSql('create index `shortlists_workspace_id_index` on `shortlists` (`workspace_id`);');
    this.addSql('create index `shortlists_created_by_id_index` on `shortlists` (`created_by_id`);');

    this.addSql(
      "create table `shortlist_versions` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `shortlist_id` text not null, `version` integer not null, `version_note` text not null default '', `scoring_run_id` text not null, `snapshot` json not null, `item_count` integer not null default 0, `created_by_id` text null, " +
        'constraint `shortlist_versions_shortlist_id_foreign` foreign key(`shortlist_id`) references `shortlists`(`id`) on delete cascade on update cascade, ' +
        'constraint `shortlist_versions_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql(
      'create unique index `shortlist_versions_shortlist_id_version_unique` on `shortlist_versions` (`shortlist_id`, `version`);',
    );
    this.addSql(
      'create index `shortlist_versions_created_by_id_index` on `shortlist_versions` (`created_by_id`);',
    );
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `shortlist_versions`;');
    this.addSql('drop table if exists `shortlists`;');
  }
}
