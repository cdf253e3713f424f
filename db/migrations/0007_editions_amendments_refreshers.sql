CREATE TABLE `org_jurisdiction` (
	`id` varchar(36) NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`state` varchar(60) NOT NULL,
	`edition` int NOT NULL,
	`irc_p2904` boolean NOT NULL DEFAULT false,
	`is_default` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `org_jurisdiction_id` PRIMARY KEY(`id`),
	CONSTRAINT `jurisdiction_org_name_uq` UNIQUE(`organization_id`,`name`,`state`)
);
--> statement-breakpoint
CREATE TABLE `local_amendment` (
	`id` varchar(36) NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`topic` varchar(20) NOT NULL,
	`body` varchar(600) NOT NULL,
	`author_id` varchar(36),
	`author_name` varchar(200) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `local_amendment_id` PRIMARY KEY(`id`),
	CONSTRAINT `amendment_org_topic_uq` UNIQUE(`organization_id`,`topic`)
);
--> statement-breakpoint
CREATE TABLE `material_change` (
	`id` int AUTO_INCREMENT NOT NULL,
	`module_slug` varchar(80) NOT NULL,
	`kind` varchar(10) NOT NULL,
	`item_slug` varchar(80) NOT NULL,
	`revision` int NOT NULL,
	`what_changed` varchar(200) NOT NULL,
	`recorded_at` datetime(3) NOT NULL,
	CONSTRAINT `material_change_id` PRIMARY KEY(`id`),
	CONSTRAINT `material_change_item_uq` UNIQUE(`module_slug`,`kind`,`item_slug`,`revision`)
);
--> statement-breakpoint
CREATE TABLE `refresher_completion` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`module_slug` varchar(80) NOT NULL,
	`score` int,
	`completed_at` datetime(3) NOT NULL,
	CONSTRAINT `refresher_completion_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `catalog_lesson` ADD `revision` int DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE `quiz_attempt` ADD `edition` int;--> statement-breakpoint
ALTER TABLE `certificate` ADD `edition` int;--> statement-breakpoint
ALTER TABLE `org_jurisdiction` ADD CONSTRAINT `org_jurisdiction_organization_id_organization_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `local_amendment` ADD CONSTRAINT `local_amendment_organization_id_organization_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `refresher_completion` ADD CONSTRAINT `refresher_completion_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `material_change_module_idx` ON `material_change` (`module_slug`,`recorded_at`);--> statement-breakpoint
CREATE INDEX `refresher_user_module_idx` ON `refresher_completion` (`user_id`,`module_slug`,`completed_at`);