CREATE TABLE `places` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`kind` enum('city','area') NOT NULL,
	`name` varchar(200) NOT NULL,
	`folded_name` varchar(200) NOT NULL,
	`alt_name` varchar(200),
	`country_code` char(2),
	`subdivision_code` varchar(20),
	`latitude` decimal(8,5) NOT NULL,
	`longitude` decimal(8,5) NOT NULL,
	`population` int unsigned NOT NULL DEFAULT 0,
	`gazetteer_id` int unsigned,
	`description` text,
	`created_by` bigint unsigned,
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `places_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sources` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`title` varchar(300) NOT NULL,
	`object_type` enum('painting','drawing','print','book_illustration','sculpture','tile','textile','other') NOT NULL,
	`artist` varchar(200),
	`attribution_qualifier` enum('by','attributed_to','workshop_of','circle_of','follower_of','after','anonymous') NOT NULL DEFAULT 'by',
	`medium` varchar(200),
	`height` decimal(8,2),
	`width` decimal(8,2),
	`dimension_unit` enum('cm','mm','in') NOT NULL DEFAULT 'cm',
	`collection_id` bigint unsigned,
	`accession_number` varchar(100),
	`dating_edtf` varchar(100),
	`dating_earliest` date,
	`dating_latest` date,
	`dating_search_earliest` date,
	`dating_search_latest` date,
	`dating_approximate` boolean NOT NULL DEFAULT false,
	`dating_uncertain` boolean NOT NULL DEFAULT false,
	`place_id` bigint unsigned,
	`country_code` char(2),
	`rights_uri` varchar(200),
	`credit_line` varchar(500),
	`description` text,
	`reliability_note` text,
	`bibliography` json NOT NULL DEFAULT ('[]'),
	`state` enum('draft','published') NOT NULL DEFAULT 'draft',
	`created_by` bigint unsigned NOT NULL,
	`deleted_at` timestamp(3),
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `sources_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE INDEX `places_folded` ON `places` (`folded_name`,`population`);--> statement-breakpoint
CREATE INDEX `places_kind_folded` ON `places` (`kind`,`folded_name`);--> statement-breakpoint
CREATE INDEX `places_gazetteer` ON `places` (`gazetteer_id`);--> statement-breakpoint
CREATE INDEX `sources_title` ON `sources` (`deleted_at`,`title`,`id`);--> statement-breakpoint
CREATE INDEX `sources_created` ON `sources` (`deleted_at`,`created_at`,`id`);--> statement-breakpoint
CREATE INDEX `sources_dating` ON `sources` (`deleted_at`,`dating_search_earliest`,`id`);--> statement-breakpoint
CREATE INDEX `sources_collection` ON `sources` (`collection_id`,`accession_number`);--> statement-breakpoint
CREATE INDEX `sources_country` ON `sources` (`country_code`,`id`);--> statement-breakpoint
CREATE INDEX `sources_creator` ON `sources` (`created_by`,`id`);--> statement-breakpoint
CREATE INDEX `sources_type` ON `sources` (`object_type`,`id`);