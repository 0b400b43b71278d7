CREATE TABLE `reports` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`kind` text NOT NULL,
	`version` integer,
	`state` text NOT NULL,
	`error` text,
	`page_size` text NOT NULL,
	`snapshot` text NOT NULL,
	`from_draft_id` integer,
	`fingerprint` text,
	`storage_key` text,
	`sha256` text,
	`byte_size` integer,
	`page_count` integer,
	`created_by` integer,
	`created_at` integer NOT NULL,
	`issued_at` integer,
	`rendered_at` integer,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `reports_shop_job_idx` ON `reports` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `reports_job_version_unique` ON `reports` (`job_id`,`version`);--> statement-breakpoint
CREATE INDEX `reports_sha256_idx` ON `reports` (`sha256`);--> statement-breakpoint
CREATE INDEX `reports_fingerprint_idx` ON `reports` (`fingerprint`);--> statement-breakpoint
ALTER TABLE `shops` ADD `logo_key` text;--> statement-breakpoint
ALTER TABLE `shops` ADD `logo_sha256` text;--> statement-breakpoint
ALTER TABLE `shops` ADD `logo_width` integer;--> statement-breakpoint
ALTER TABLE `shops` ADD `logo_height` integer;