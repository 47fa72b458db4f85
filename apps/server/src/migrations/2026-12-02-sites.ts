import { Migration } from '@mikro-orm/migrations';

/** Candidate sites, own stores and competitor stores per workspace. */
export class Migration20261202000200Sites extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `sites` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `workspace_id` text not null, `kind` text not null, `name` text not null, `lon` real not null, `lat` real not null, `attractiveness` real not null, `attractiveness_label` text not null default \'\', `notes` text not null default \'\', `created_by_id` text null, ' +
        'constraint `sites_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, ' +
        'constraint `sites_workspace_id_foreign` foreign key(`workspace_id`) references `workspaces`(`id`) on delete cascade on update cascade, ' +
        'constraint `sites_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql('create index `sites_organization_id_index` on `sites` (`organization_id`);');
    this.addSql('create index `sites_workspace_id_kind_index` on `sites` (`workspace_id`, `kind`);');
    this.addSql('create index `sites_created_by_id_index` on `sites` (`created_by_id`);');
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `sites`;');
  }
}
