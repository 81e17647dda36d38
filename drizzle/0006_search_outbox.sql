CREATE TABLE `search_outbox` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`entity_type` enum('region','source') NOT NULL,
	`entity_id` bigint unsigned NOT NULL,
	`revision` int unsigned NOT NULL DEFAULT 1,
	`attempts` int unsigned NOT NULL DEFAULT 0,
	`next_attempt_at` timestamp(3) NOT NULL DEFAULT (now()),
	`locked_by` varchar(100),
	`locked_until` timestamp(3),
	`last_error` text,
	`delivered_at` timestamp(3),
	`pending` tinyint GENERATED ALWAYS AS (IF(delivered_at IS NULL, 1, NULL)) STORED,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `search_outbox_id` PRIMARY KEY(`id`),
	CONSTRAINT `search_outbox_pending` UNIQUE(`entity_type`,`entity_id`,`pending`)
);
--> statement-breakpoint
CREATE INDEX `search_outbox_due` ON `search_outbox` (`delivered_at`,`next_attempt_at`);