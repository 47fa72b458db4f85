import { Migration } from '@mikro-orm/migrations';

/** Customer files (metadata, detection, validation report) and their packed point chunks. */
export class Migration20261202000000CustomerFiles extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `customer_files` (`id` text not null, `created_at` datetime not null, `updated_at` datetime not null, `organization_id` text not null, `workspace_id` text not null, `name` text not null, `size_bytes` integer not null, `format` text not null, `status` text not null, `error` json null, `detected` json not null, `mapping` json null, `weight_kind` text null, `weight_label` text null, `exclude_flagged` integer not null default 0, `row_count` integer not null default 0, `accepted_count` integer not null default 0, `rejected_count` integer not null default 0, `flagged_count` integer not null default 0, `excluded_count` integer not null default 0, `report` json null, `bbox` json null, `total_weight` real not null default 0, `stored_name` text null, `rejected_csv` blob null, `created_by_id` text null, `imported_at` datetime null, constraint `customer_files_organization_id_foreign` foreign key(`organization_id`) references `organizations`(`id`) on delete cascade on update cascade, constraint `customer_files_workspace_id_foreign` foreign key(`workspace_id`) references `workspaces`(`id`) on delete cascade on update cascade, constraint `customer_files_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on delete set null on update cascade, primary key (`id`));',
    );
    this.addSql(
      'create index `customer_files_organization_id_index` on `customer_files` (`organization_id`);',
    );
    this.addSql(
      'create index `customer_files_workspace_id_index` on `customer_files` (`workspace_id`);',
    );
    this.addSql('create index `customer_files_status_index` on `customer_files` (`status`);');

    this.addSql(
      'create table `customer_point_chunks` (`id` text not null, `customer_file_id` text not null, `seq` integer not null, `count` integer not null, `data` blob not null, `flags` blob not null, constraint `customer_point_chunks_customer_file_id_foreign` foreign key(`customer_file_id`) references `customer_files`(`id`) on delete cascade on update cascade, primary key (`id`));',
    );
    this.addSql(
      'create unique index `customer_point_chunks_customer_file_id_seq_unique` on `customer_point_chunks` (`customer_file_id`, `seq`);',
    );
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `customer_point_chunks`;');
    this.addSql('drop table if exists `customer_files`;');
  }
}
