ALTER TABLE `media_assets` ADD `client_id` text;--> statement-breakpoint
CREATE UNIQUE INDEX `media_assets_shop_client_idx` ON `media_assets` (`shop_id`,`client_id`);