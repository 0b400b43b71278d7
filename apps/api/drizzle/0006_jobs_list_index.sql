DROP INDEX `jobs_shop_status_idx`;--> statement-breakpoint
CREATE INDEX `jobs_shop_status_promised_idx` ON `jobs` (`shop_id`,`status`,`promised_on`,`id`);