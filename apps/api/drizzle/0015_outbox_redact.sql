ALTER TABLE `outbox_messages` ADD `text_after_send` text;--> statement-breakpoint
ALTER TABLE `outbox_messages` ADD `html_after_send` text;