ALTER TABLE `customers` ADD `preferred_channel` text DEFAULT 'email' NOT NULL;--> statement-breakpoint
ALTER TABLE `bikes` ADD `tyre_size` text;--> statement-breakpoint
ALTER TABLE `final_checks` ADD `items` text;--> statement-breakpoint
ALTER TABLE `final_checks` ADD `test_ride_notes` text;