ALTER TABLE `recommendations` ADD `urgency` text;--> statement-breakpoint
ALTER TABLE `torque_entries` ADD `tool_calibrated_on` text;--> statement-breakpoint
ALTER TABLE `torque_entries` ADD `threadlocker` text;