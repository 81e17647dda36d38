CREATE TABLE `images` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`source_id` bigint unsigned NOT NULL,
	`storage_key` char(36) NOT NULL,
	`kind` enum('whole','detail') NOT NULL DEFAULT 'whole',
	`caption` varchar(300),
	`photo_credit` varchar(300),
	`rights_uri` varchar(200),
	`original_filename` varchar(255) NOT NULL,
	`declared_type` varchar(100),
	`mime_type` varchar(100),
	`byte_size` int unsigned,
	`width` int unsigned,
	`height` int unsigned,
	`sha256` char(64),
	`phash` char(16),
	`near_duplicate_of` bigint unsigned,
	`near_duplicate_distance` int,
	`state` enum('uploading','waiting','processing','ready','failed') NOT NULL DEFAULT 'uploading',
	`failure_reason` text,
	`multipart_upload_id` varchar(300),
	`position` int NOT NULL DEFAULT 0,
	`uploaded_by` bigint unsigned NOT NULL,
	`ready_at` timestamp(3),
	`deleted_at` timestamp(3),
	`version` int unsigned NOT NULL DEFAULT 1,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `images_id` PRIMARY KEY(`id`),
	CONSTRAINT `images_storage_key` UNIQUE(`storage_key`)
);
--> statement-breakpoint
CREATE TABLE `jobs` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`kind` varchar(40) NOT NULL,
	`payload` json NOT NULL,
	`state` enum('queued','running','done','failed') NOT NULL DEFAULT 'queued',
	`run_at` timestamp(3) NOT NULL DEFAULT (now()),
	`attempts` int unsigned NOT NULL DEFAULT 0,
	`max_attempts` int unsigned NOT NULL DEFAULT 4,
	`locked_by` varchar(100),
	`locked_at` timestamp(3),
	`last_error` text,
	`finished_at` timestamp(3),
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `jobs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE INDEX `images_source` ON `images` (`source_id`,`position`,`id`);--> statement-breakpoint
CREATE INDEX `images_sha256` ON `images` (`sha256`);--> statement-breakpoint
CREATE INDEX `images_state` ON `images` (`state`,`updated_at`);--> statement-breakpoint
CREATE INDEX `jobs_due` ON `jobs` (`state`,`run_at`);--> statement-breakpoint
CREATE INDEX `jobs_kind` ON `jobs` (`kind`,`state`);