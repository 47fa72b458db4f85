import { Migration } from '@mikro-orm/migrations';

/** Demand-surface runs (the job rows) and their result rasters. */
export class Migration20261202000100Surfaces extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `surfaces` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `workspace_id` text not null, `customer_file_id` text null, `name` text not null, `status` text not null, `progress` real not null default 0, `params` json not null, `resolved` json null, `engine_version` text not null, `attempts` integer not null default 0, `claimed_by` text null, `heartbeat_at` datetime null, `queued_at` datetime not null, `started_at` datetime null, `finished_at` datetime null, `timings` json null, `error` json null, `stats` json null, `thresholds` json null, `point_count` integer not null default 0, `cost_credits` integer not null default 0, `credit_ref` text null, `created_by_id` text null, ' +
        'constraint `surfaces_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, ' +
        'constraint `surfaces_workspace_id_foreign` foreign key(`workspace_id`) references `workspaces`(`id`) on delete cascade on update cascade, ' +
        'constraint `surfaces_customer_file_id_foreign` foreign key(`customer_file_id`) references `customer_files`(`id`) on delete set null on update cascade, ' +
        'constraint `surfaces_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql('create index `surfaces_workspace_id_index` on `surfaces` (`workspace_id`);');
    this.addSql('create index `surfaces_organization_id_index` on `surfaces` (`organization_id`);');
    this.addSql('create index `surfaces_customer_file_id_index` on `surfaces` (`customer_file_id`);');
    this.addSql('create index `surfaces_created_by_id_index` on `surfaces` (`created_by_id`);');
    // The runner's claim looks for the oldest queued row.
    this.addSql('create index `surfaces_status_queued_at_index` on `surfaces` (`status`, `queued_at`);');

    this.addSql(
      'create table `surface_rasters` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `surface_id` text not null, `kind` text not null, `width` integer not null, `height` integer not null, `data` blob not null, `contours` json not null, ' +
        'constraint `surface_rasters_surface_id_foreign` foreign key(`surface_id`) references `surfaces`(`id`) on delete cascade on update cascade, primary key (`id`));',
    );
    this.addSql('create unique index `surface_rasters_surface_id_kind_unique` on `surface_rasters` (`surface_id`, `kind`);');
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `surface_rasters`;');
    this.addSql('drop table if exists `surfaces`;');
  }
}
