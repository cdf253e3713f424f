CREATE TABLE `lesson_open` (
	`user_id` varchar(36) NOT NULL,
	`lesson_id` int NOT NULL,
	`first_opened_at` datetime(3) NOT NULL,
	CONSTRAINT `lesson_open_pk` PRIMARY KEY(`user_id`,`lesson_id`)
);
--> statement-breakpoint
CREATE TABLE `mail_outbox` (
	`id` int AUTO_INCREMENT NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`dedupe_key` varchar(191),
	`to` varchar(255) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`body` text NOT NULL,
	`status` varchar(12) NOT NULL DEFAULT 'pending',
	`tries` int NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL,
	`claimed_until` datetime(3),
	`last_error` text,
	`sent_at` datetime(3),
	CONSTRAINT `mail_outbox_id` PRIMARY KEY(`id`),
	CONSTRAINT `outbox_dedupe_uq` UNIQUE(`dedupe_key`)
);
--> statement-breakpoint
ALTER TABLE `lesson_open` ADD CONSTRAINT `lesson_open_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lesson_open` ADD CONSTRAINT `lesson_open_lesson_id_catalog_lesson_id_fk` FOREIGN KEY (`lesson_id`) REFERENCES `catalog_lesson`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `lesson_open_lesson_idx` ON `lesson_open` (`lesson_id`);--> statement-breakpoint
CREATE INDEX `outbox_due_idx` ON `mail_outbox` (`status`,`next_attempt_at`);