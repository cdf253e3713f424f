CREATE TABLE `former_membership` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`joined_at` datetime(3),
	`left_at` datetime(3) NOT NULL,
	CONSTRAINT `former_membership_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `user` ADD `organization_since` datetime(3);--> statement-breakpoint
ALTER TABLE `former_membership` ADD CONSTRAINT `former_membership_organization_id_organization_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `former_membership_org_user_idx` ON `former_membership` (`organization_id`,`user_id`,`left_at`);