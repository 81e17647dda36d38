DROP INDEX `sources_title` ON `sources`;--> statement-breakpoint
DROP INDEX `sources_created` ON `sources`;--> statement-breakpoint
DROP INDEX `sources_dating` ON `sources`;--> statement-breakpoint
DROP INDEX `sources_country` ON `sources`;--> statement-breakpoint
DROP INDEX `sources_type` ON `sources`;--> statement-breakpoint
CREATE INDEX `sources_title` ON `sources` (`title`,`id`);--> statement-breakpoint
CREATE INDEX `sources_created` ON `sources` (`created_at`,`id`);--> statement-breakpoint
CREATE INDEX `sources_dating` ON `sources` (`dating_search_earliest`,`id`);--> statement-breakpoint
CREATE INDEX `sources_country` ON `sources` (`country_code`,`state`,`deleted_at`);--> statement-breakpoint
CREATE INDEX `sources_type` ON `sources` (`object_type`,`state`,`deleted_at`);