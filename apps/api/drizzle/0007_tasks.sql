CREATE TABLE `tasks` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer,
	`kind` text NOT NULL,
	`key` text NOT NULL,
	`payload` text NOT NULL,
	`status` text DEFAULT 'queued' NOT NULL,
	`attempts` integer DEFAULT 0 NOT NULL,
	`last_error` text,
	`progress` real DEFAULT 0 NOT NULL,
	`next_run_at` integer NOT NULL,
	`leased_until` integer,
	`lease_owner` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `tasks_kind_key_unique` ON `tasks` (`kind`,`key`);--> statement-breakpoint
CREATE INDEX `tasks_due_idx` ON `tasks` (`status`,`kind`,`next_run_at`);