import { Migration } from '@mikro-orm/migrations';

/** Scoring settings (one row per workspace) and scoring runs with their snapshots and results. */
export class Migration20261202000300Scoring extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `scoring_settings` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `workspace_id` text not null, `alpha` real not null, `beta` real not null, `radii` json not null, `radius_unit` text not null, `measure` text not null, `min_distance_m` real null, `updated_by_id` text null, ' +
        'constraint `scoring_settings_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, ' +
        'constraint `scoring_settings_workspace_id_foreign` foreign key(`workspace_id`) references `workspaces`(`id`) on delete cascade on update cascade, ' +
        'constraint `scoring_settings_updated_by_id_foreign` foreign key(`updated_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql('create index `scoring_settings_organization_id_index` on `scoring_settings` (`organization_id`);');
    this.addSql('create unique index `scoring_settings_workspace_id_unique` on `scoring_settings` (`workspace_id`);');
    this.addSql('create index `scoring_settings_updated_by_id_index` on `scoring_settings` (`updated_by_id`);');

    this.addSql(
      'create table `scoring_runs` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `workspace_id` text not null, `surface_id` text null, `surface_name` text not null, `name` text not null, `status` text not null, `progress` real not null default 0, `settings` json not null, `sites` json not null, `surface_info` json not null, `weight_label` text not null, `candidate_count` integer not null default 0, `results` json null, `stability` json null, `sets` json not null, `warnings` json not null, `error` json null, `timings` json null, `claimed_by` text null, `heartbeat_at` datetime null, `started_at` datetime null, `finished_at` datetime null, `created_by_id` text null, ' +
        'constraint `scoring_runs_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, ' +
        'constraint `scoring_runs_workspace_id_foreign` foreign key(`workspace_id`) references `workspaces`(`id`) on delete cascade on update cascade, ' +
        'constraint `scoring_runs_surface_id_foreign` foreign key(`surface_id`) references `surfaces`(`id`) on delete set null on update cascade, ' +
        'constraint `scoring_runs_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql('create index `scoring_runs_organization_id_index` on `scoring_runs` (`organization_id`);');
    this.addSql('create index `scoring_runs_workspace_id_created_at_index` on `scoring_runs` (`workspace_id`, `created_at`);');
    this.addSql('create index `scoring_runs_surface_id_index` on `scoring_runs` (`surface_id`);');
    this.addSql('create index `scoring_runs_created_by_id_index` on `scoring_runs` (`created_by_id`);');
    this.addSql('create index `scoring_runs_status_index` on `scoring_runs` (`status`);');
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `scoring_runs`;');
    this.addSql('drop table if exists `scoring_settings`;');
  }
}
