CREATE TABLE `checkout_sessions` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`provider_id` text NOT NULL,
	`idempotency_key` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`url` text NOT NULL,
	`status` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `checkout_sessions_provider_unique` ON `checkout_sessions` (`provider_id`);--> statement-breakpoint
CREATE INDEX `checkout_sessions_shop_job_idx` ON `checkout_sessions` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `payments` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`kind` text NOT NULL,
	`method` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`refund_of` integer,
	`staff_id` integer,
	`note` text DEFAULT '' NOT NULL,
	`provider_ref` text,
	`flag` text,
	`flag_cleared_at` integer,
	`at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`staff_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `payments_shop_job_idx` ON `payments` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `payments_provider_ref_unique` ON `payments` (`provider_ref`);--> statement-breakpoint
CREATE TABLE `text_messages` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer,
	`customer_id` integer NOT NULL,
	`kind` text NOT NULL,
	`to_number` text NOT NULL,
	`body` text NOT NULL,
	`body_after_send` text,
	`status` text NOT NULL,
	`attempts` integer DEFAULT 0 NOT NULL,
	`last_error` text,
	`provider_sid` text,
	`sent_at` integer,
	`status_at` integer,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`customer_id`) REFERENCES `customers`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `text_messages_shop_job_idx` ON `text_messages` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `text_messages_sid_idx` ON `text_messages` (`provider_sid`);--> statement-breakpoint
ALTER TABLE `shops` ADD `country` text DEFAULT 'GB' NOT NULL;--> statement-breakpoint
ALTER TABLE `shops` ADD `tax_number` text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE `customers` ADD `sms_opt_out_at` integer;--> statement-breakpoint
ALTER TABLE `work_entries` ADD `rate_minor` integer;