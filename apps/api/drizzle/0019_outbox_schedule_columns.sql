DROP INDEX `outbox_status_next_idx`;--> statement-breakpoint
ALTER TABLE `outbox_messages` DROP COLUMN `round`;--> statement-breakpoint
ALTER TABLE `outbox_messages` DROP COLUMN `next_try_at`;--> statement-breakpoint
ALTER TABLE `outbox_messages` DROP COLUMN `sending_since`;