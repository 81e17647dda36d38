CREATE TABLE `dossier_items` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`dossier_id` bigint unsigned NOT NULL,
	`kind` enum('region','source') NOT NULL,
	`region_id` bigint unsigned,
	`source_id` bigint unsigned,
	`position` int NOT NULL DEFAULT 0,
	`note` text,
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `dossier_items_id` PRIMARY KEY(`id`),
	CONSTRAINT `dossier_items_region` UNIQUE(`dossier_id`,`region_id`),
	CONSTRAINT `dossier_items_source` UNIQUE(`dossier_id`,`source_id`)
);
--> statement-breakpoint
CREATE TABLE `dossier_shares` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`dossier_id` bigint unsigned NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `dossier_shares_id` PRIMARY KEY(`id`),
	CONSTRAINT `dossier_shares_pair` UNIQUE(`dossier_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `dossiers` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`owner_id` bigint unsigned NOT NULL,
	`title` varchar(200) NOT NULL,
	`description` text,
	`visibility` enum('private','shared','public') NOT NULL DEFAULT 'private',
	`deleted_at` timestamp(3),
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `dossiers_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE INDEX `dossier_items_order` ON `dossier_items` (`dossier_id`,`position`,`id`);--> statement-breakpoint
CREATE INDEX `dossier_shares_user` ON `dossier_shares` (`user_id`);--> statement-breakpoint
CREATE INDEX `dossiers_owner` ON `dossiers` (`owner_id`,`deleted_at`,`updated_at`);--> statement-breakpoint
CREATE INDEX `dossiers_visibility` ON `dossiers` (`visibility`,`deleted_at`);