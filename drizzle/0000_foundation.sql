CREATE TABLE `users` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(120) NOT NULL,
	`role` enum('reader','contributor','editor','admin') NOT NULL DEFAULT 'reader',
	`password_hash` varchar(255),
	`email_verified_at` timestamp(3),
	`disabled_at` timestamp(3),
	`last_sign_in_at` timestamp(3),
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `verification_tokens` (
	`identifier` varchar(254) NOT NULL,
	`token` varchar(128) NOT NULL,
	`expires` timestamp(3) NOT NULL,
	CONSTRAINT `verification_tokens_identifier_token_pk` PRIMARY KEY(`identifier`,`token`)
);
--> statement-breakpoint
CREATE TABLE `account_tokens` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`purpose` enum('password_reset','invitation') NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`email` varchar(254) NOT NULL,
	`role` enum('reader','contributor','editor','admin'),
	`user_id` bigint unsigned,
	`created_by` bigint unsigned,
	`expires_at` timestamp(3) NOT NULL,
	`used_at` timestamp(3),
	`revoked_at` timestamp(3),
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `account_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `account_tokens_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `audit_events` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`actor_id` bigint unsigned,
	`action` varchar(64) NOT NULL,
	`entity_type` varchar(40) NOT NULL,
	`entity_id` varchar(64) NOT NULL,
	`before` json,
	`after` json,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `audit_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sign_in_limits` (
	`key` varchar(255) NOT NULL,
	`points` int NOT NULL DEFAULT 0,
	`expire` bigint unsigned,
	CONSTRAINT `sign_in_limits_key` PRIMARY KEY(`key`)
);
--> statement-breakpoint
CREATE TABLE `collections` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`name` varchar(200) NOT NULL,
	`city` varchar(120),
	`country_code` char(2),
	`url` varchar(500),
	`notes` text,
	`created_by` bigint unsigned,
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `collections_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE INDEX `account_tokens_email` ON `account_tokens` (`email`);--> statement-breakpoint
CREATE INDEX `audit_entity` ON `audit_events` (`entity_type`,`entity_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_actor` ON `audit_events` (`actor_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_created` ON `audit_events` (`created_at`);--> statement-breakpoint
CREATE INDEX `collections_name` ON `collections` (`name`);