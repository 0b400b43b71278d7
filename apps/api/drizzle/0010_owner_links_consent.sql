CREATE TABLE `owner_links` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`token_hash` text NOT NULL,
	`created_by` integer NOT NULL,
	`created_at` integer NOT NULL,
	`expires_at` integer NOT NULL,
	`revoked_at` integer,
	`revoked_by` integer,
	`last_viewed_at` integer,
	`sent_to` text DEFAULT '' NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`revoked_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `owner_links_token_hash_unique` ON `owner_links` (`token_hash`);--> statement-breakpoint
CREATE INDEX `owner_links_shop_job_idx` ON `owner_links` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `consents` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`granted` integer NOT NULL,
	`name_make_model` integer NOT NULL,
	`wording_version` text NOT NULL,
	`method` text NOT NULL,
	`given_by_name` text NOT NULL,
	`recorded_by` integer,
	`owner_link_id` integer,
	`at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`owner_link_id`) REFERENCES `owner_links`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `consents_shop_job_idx` ON `consents` (`shop_id`,`job_id`,`at`);