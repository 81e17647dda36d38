CREATE TABLE `aspect_terms` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`aspect_id` bigint unsigned NOT NULL,
	`key` varchar(60) NOT NULL,
	`label` varchar(120) NOT NULL,
	`description` text,
	`position` int NOT NULL DEFAULT 0,
	`deprecated_at` timestamp(3),
	`merged_into_id` bigint unsigned,
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `aspect_terms_id` PRIMARY KEY(`id`),
	CONSTRAINT `aspect_terms_key` UNIQUE(`aspect_id`,`key`)
);
--> statement-breakpoint
CREATE TABLE `aspects` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`key` varchar(60) NOT NULL,
	`label` varchar(120) NOT NULL,
	`description` text,
	`kind` enum('terms','count','text') NOT NULL,
	`section` enum('instrument','player','context','reliability') NOT NULL,
	`position` int NOT NULL DEFAULT 0,
	`deprecated_at` timestamp(3),
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `aspects_id` PRIMARY KEY(`id`),
	CONSTRAINT `aspects_key` UNIQUE(`key`)
);
--> statement-breakpoint
CREATE TABLE `observations` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`region_version_id` bigint unsigned NOT NULL,
	`aspect_id` bigint unsigned NOT NULL,
	`term_id` bigint unsigned,
	`count_value` smallint unsigned,
	`text_value` varchar(500),
	`confidence` enum('certain','probable','possible') NOT NULL,
	`note` text,
	`position` int NOT NULL DEFAULT 0,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `observations_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `region_comments` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`region_id` bigint unsigned NOT NULL,
	`author_id` bigint unsigned NOT NULL,
	`body` text NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `region_comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `region_reviews` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`region_id` bigint unsigned NOT NULL,
	`region_version_id` bigint unsigned NOT NULL,
	`reviewer_id` bigint unsigned NOT NULL,
	`decision` enum('vetted','returned') NOT NULL,
	`comment` text,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `region_reviews_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `region_versions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`region_id` bigint unsigned NOT NULL,
	`number` int unsigned NOT NULL,
	`state` enum('draft','proposed','vetted','returned','withdrawn') NOT NULL DEFAULT 'draft',
	`shape` json NOT NULL,
	`box_x` int unsigned NOT NULL,
	`box_y` int unsigned NOT NULL,
	`box_w` int unsigned NOT NULL,
	`box_h` int unsigned NOT NULL,
	`label` varchar(200),
	`created_by` bigint unsigned NOT NULL,
	`proposed_at` timestamp(3),
	`decided_at` timestamp(3),
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `region_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `region_versions_number` UNIQUE(`region_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `regions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`image_id` bigint unsigned NOT NULL,
	`author_id` bigint unsigned NOT NULL,
	`working_version_id` bigint unsigned,
	`vetted_version_id` bigint unsigned,
	`state` enum('draft','proposed','vetted','returned','withdrawn') NOT NULL DEFAULT 'draft',
	`proposed_at` timestamp(3),
	`deleted_at` timestamp(3),
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `regions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `notifications` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`kind` varchar(40) NOT NULL,
	`subject` varchar(300) NOT NULL,
	`body` text NOT NULL,
	`link` varchar(500),
	`payload` json,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`sent_at` timestamp(3),
	CONSTRAINT `notifications_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `users` ADD `notify` enum('immediate','daily','off') DEFAULT 'immediate' NOT NULL;--> statement-breakpoint
CREATE INDEX `aspect_terms_order` ON `aspect_terms` (`aspect_id`,`position`);--> statement-breakpoint
CREATE INDEX `aspects_order` ON `aspects` (`section`,`position`);--> statement-breakpoint
CREATE INDEX `observations_version` ON `observations` (`region_version_id`,`position`);--> statement-breakpoint
CREATE INDEX `observations_aspect` ON `observations` (`aspect_id`,`term_id`);--> statement-breakpoint
CREATE INDEX `observations_term` ON `observations` (`term_id`);--> statement-breakpoint
CREATE INDEX `region_comments_region` ON `region_comments` (`region_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `region_reviews_region` ON `region_reviews` (`region_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `regions_image` ON `regions` (`image_id`,`id`);--> statement-breakpoint
CREATE INDEX `regions_state` ON `regions` (`state`,`proposed_at`);--> statement-breakpoint
CREATE INDEX `regions_author` ON `regions` (`author_id`,`state`);--> statement-breakpoint
CREATE INDEX `notifications_pending` ON `notifications` (`user_id`,`sent_at`,`created_at`);