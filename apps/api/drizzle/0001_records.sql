CREATE TABLE `customers` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`name` text NOT NULL,
	`email` text DEFAULT '' NOT NULL,
	`phone` text DEFAULT '' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `customers_shop_name_idx` ON `customers` (`shop_id`,`name`);--> statement-breakpoint
CREATE INDEX `customers_shop_email_idx` ON `customers` (`shop_id`,`email`);--> statement-breakpoint
CREATE TABLE `bikes` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`customer_id` integer NOT NULL,
	`maker` text NOT NULL,
	`model` text NOT NULL,
	`year` integer,
	`frame_material` text NOT NULL,
	`size` text DEFAULT '' NOT NULL,
	`colour` text DEFAULT '' NOT NULL,
	`serial_number` text DEFAULT '' NOT NULL,
	`drivetrain_speeds` integer NOT NULL,
	`brake_type` text NOT NULL,
	`cable_routing` text NOT NULL,
	`dropout_type` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`customer_id`) REFERENCES `customers`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `bikes_shop_customer_idx` ON `bikes` (`shop_id`,`customer_id`);--> statement-breakpoint
CREATE INDEX `bikes_shop_serial_idx` ON `bikes` (`shop_id`,`serial_number`);--> statement-breakpoint
CREATE INDEX `bikes_shop_maker_model_idx` ON `bikes` (`shop_id`,`maker`,`model`);--> statement-breakpoint
CREATE TABLE `jobs` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`number` text NOT NULL,
	`bike_id` integer NOT NULL,
	`customer_id` integer NOT NULL,
	`status` text NOT NULL,
	`reported_symptoms` text DEFAULT '' NOT NULL,
	`promised_on` text,
	`mechanic_id` integer,
	`final_checker_id` integer,
	`created_by` integer,
	`booked_in_at` integer NOT NULL,
	`on_stand_at` integer,
	`waiting_owner_at` integer,
	`in_work_at` integer,
	`final_check_at` integer,
	`ready_at` integer,
	`collected_at` integer,
	`cancelled_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`bike_id`) REFERENCES `bikes`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`customer_id`) REFERENCES `customers`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`mechanic_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`final_checker_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `jobs_shop_number_unique` ON `jobs` (`shop_id`,`number`);--> statement-breakpoint
CREATE INDEX `jobs_shop_status_idx` ON `jobs` (`shop_id`,`status`);--> statement-breakpoint
CREATE INDEX `jobs_shop_mechanic_idx` ON `jobs` (`shop_id`,`mechanic_id`);--> statement-breakpoint
CREATE INDEX `jobs_shop_promised_idx` ON `jobs` (`shop_id`,`promised_on`);--> statement-breakpoint
CREATE INDEX `jobs_shop_bike_idx` ON `jobs` (`shop_id`,`bike_id`);--> statement-breakpoint
CREATE TABLE `job_status_events` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`from_status` text,
	`to_status` text NOT NULL,
	`user_id` integer,
	`note` text DEFAULT '' NOT NULL,
	`at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `job_status_events_job_idx` ON `job_status_events` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `checkpoints` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`area` text NOT NULL,
	`key` text NOT NULL,
	`label` text NOT NULL,
	`position` integer NOT NULL,
	`safety_critical` integer DEFAULT false NOT NULL,
	`condition` text,
	`notes` text DEFAULT '' NOT NULL,
	`inspected_by` integer,
	`inspected_at` integer,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`inspected_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `checkpoints_job_key_unique` ON `checkpoints` (`job_id`,`key`);--> statement-breakpoint
CREATE INDEX `checkpoints_shop_job_idx` ON `checkpoints` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `measurements` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`checkpoint_id` integer,
	`kind` text NOT NULL,
	`input` text NOT NULL,
	`result` text NOT NULL,
	`unit` text NOT NULL,
	`user_id` integer,
	`at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`checkpoint_id`) REFERENCES `checkpoints`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `measurements_shop_job_idx` ON `measurements` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `measurements_checkpoint_idx` ON `measurements` (`checkpoint_id`);--> statement-breakpoint
CREATE TABLE `findings` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`checkpoint_id` integer,
	`area` text NOT NULL,
	`condition` text NOT NULL,
	`description` text NOT NULL,
	`created_by` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`checkpoint_id`) REFERENCES `checkpoints`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `findings_shop_job_idx` ON `findings` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `recommendations` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`finding_id` integer NOT NULL,
	`summary` text NOT NULL,
	`parts` text NOT NULL,
	`labour_hundredths` integer NOT NULL,
	`labour_rate_minor` integer NOT NULL,
	`tax_rate_bp` integer NOT NULL,
	`currency` text NOT NULL,
	`decision_status` text DEFAULT 'pending' NOT NULL,
	`created_by` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`finding_id`) REFERENCES `findings`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `recommendations_finding_unique` ON `recommendations` (`finding_id`);--> statement-breakpoint
CREATE INDEX `recommendations_shop_job_idx` ON `recommendations` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `decisions` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`recommendation_id` integer NOT NULL,
	`status` text NOT NULL,
	`channel` text NOT NULL,
	`decided_by_name` text NOT NULL,
	`recorded_by` integer,
	`note` text DEFAULT '' NOT NULL,
	`decided_at` integer NOT NULL,
	`recorded_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recommendation_id`) REFERENCES `recommendations`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `decisions_shop_job_idx` ON `decisions` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `decisions_recommendation_idx` ON `decisions` (`recommendation_id`);--> statement-breakpoint
CREATE TABLE `work_entries` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`description` text NOT NULL,
	`parts_used` text DEFAULT '' NOT NULL,
	`minutes` integer NOT NULL,
	`user_id` integer,
	`at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `work_entries_shop_job_idx` ON `work_entries` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `torque_entries` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`fastener` text NOT NULL,
	`input` text NOT NULL,
	`result` text NOT NULL,
	`spec_value` real NOT NULL,
	`spec_unit` text NOT NULL,
	`applied_value` real NOT NULL,
	`applied_unit` text NOT NULL,
	`spec_source` text NOT NULL,
	`tool` text DEFAULT '' NOT NULL,
	`carbon_part` integer DEFAULT false NOT NULL,
	`user_id` integer,
	`at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `torque_entries_shop_job_idx` ON `torque_entries` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE TABLE `final_checks` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`checker_id` integer NOT NULL,
	`passed` integer NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`checker_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `final_checks_shop_job_idx` ON `final_checks` (`shop_id`,`job_id`);