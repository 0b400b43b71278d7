ALTER TABLE `jobs` ADD `report_sent` integer DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `tasks` ADD `retry_later` integer DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `outbox_messages` ADD `task_key` text DEFAULT '' NOT NULL;--> statement-breakpoint
UPDATE `jobs` SET `report_sent` = 1 WHERE EXISTS (SELECT 1 FROM `outbox_messages` m WHERE m.`job_id` = `jobs`.`id` AND m.`kind` = 'report_ready' AND m.`status` <> 'failed');--> statement-breakpoint
UPDATE `outbox_messages` SET `task_key` = `id` || '.' || `round`;--> statement-breakpoint
UPDATE `tasks` SET `payload` = json_object('messageId', CAST(substr(`key`, 1, instr(`key`, '.') - 1) AS INTEGER)) WHERE `kind` = 'mail.send';--> statement-breakpoint
INSERT INTO `tasks` (`shop_id`, `kind`, `key`, `payload`, `status`, `attempts`, `progress`, `next_run_at`, `retry_later`, `created_at`, `updated_at`)
  SELECT `shop_id`, 'mail.send', `task_key`, json_object('messageId', `id`), 'queued', 0, 0, coalesce(`next_try_at`, `created_at`), 0, `created_at`, `created_at`
  FROM `outbox_messages` WHERE `status` IN ('queued', 'sending')
  ON CONFLICT (`kind`, `key`) DO UPDATE SET `status` = 'queued', `next_run_at` = excluded.`next_run_at`, `lease_owner` = NULL, `leased_until` = NULL WHERE `tasks`.`status` <> 'running';--> statement-breakpoint
DELETE FROM `tasks` WHERE `kind` = 'storage.sweep';
