CREATE TABLE `showcase_items` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`pair_id` integer NOT NULL,
	`favourite` integer DEFAULT false NOT NULL,
	`caption` text,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`pair_id`) REFERENCES `shot_pairs`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `showcase_items_shop_pair_uq` ON `showcase_items` (`shop_id`,`pair_id`);