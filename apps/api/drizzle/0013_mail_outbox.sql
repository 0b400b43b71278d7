CREATE TABLE `outbox_messages` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer,
	`kind` text NOT NULL,
	`report_id` integer,
	`to_address` text NOT NULL,
	`subject` text NOT NULL,
	`text_body` text NOT NULL,
	`html_body` text NOT NULL,
	`attachments` text NOT NULL,
	`status` text NOT NULL,
	`attempts` integer DEFAULT 0 NOT NULL,
	`round` integer DEFAULT 0 NOT NULL,
	`last_error` text,
	`next_try_at` integer,
	`sending_since` integer,
	`sent_at` integer,
	`message_id` text NOT NULL,
	`smtp_response` text,
	`created_by` integer,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `outbox_shop_job_idx` ON `outbox_messages` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `outbox_status_next_idx` ON `outbox_messages` (`status`,`next_try_at`);--> statement-breakpoint
ALTER TABLE `jobs` ADD `collected_without_report` integer DEFAULT false NOT NULL;