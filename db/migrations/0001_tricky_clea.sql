ALTER TABLE `team` ADD `archived_at` datetime(3);--> statement-breakpoint
ALTER TABLE `invitation` ADD `revoked_by` varchar(36);--> statement-breakpoint
ALTER TABLE `invitation` ADD `last_sent_at` datetime(3);--> statement-breakpoint
ALTER TABLE `invitation` ADD `send_count` int DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE `invitation` ADD `assign_on_accept` json;