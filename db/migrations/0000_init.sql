CREATE TABLE `account` (
	`id` varchar(36) NOT NULL,
	`account_id` text NOT NULL,
	`provider_id` text NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`access_token` text,
	`refresh_token` text,
	`id_token` text,
	`access_token_expires_at` timestamp(3),
	`refresh_token_expires_at` timestamp(3),
	`scope` text,
	`password` text,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL,
	CONSTRAINT `account_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `rate_limit` (
	`id` varchar(36) NOT NULL,
	`key` varchar(255) NOT NULL,
	`count` int NOT NULL,
	`last_request` bigint NOT NULL,
	CONSTRAINT `rate_limit_id` PRIMARY KEY(`id`),
	CONSTRAINT `rate_limit_key_unique` UNIQUE(`key`)
);
--> statement-breakpoint
CREATE TABLE `session` (
	`id` varchar(36) NOT NULL,
	`expires_at` timestamp(3) NOT NULL,
	`token` varchar(255) NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL,
	`ip_address` text,
	`user_agent` text,
	`user_id` varchar(36) NOT NULL,
	`impersonated_by` text,
	CONSTRAINT `session_id` PRIMARY KEY(`id`),
	CONSTRAINT `session_token_unique` UNIQUE(`token`)
);
--> statement-breakpoint
CREATE TABLE `user` (
	`id` varchar(36) NOT NULL,
	`name` varchar(200) NOT NULL,
	`email` varchar(255) NOT NULL,
	`email_verified` boolean NOT NULL DEFAULT false,
	`image` text,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()),
	`role` varchar(20) NOT NULL DEFAULT 'learner',
	`banned` boolean DEFAULT false,
	`ban_reason` text,
	`ban_expires` timestamp(3),
	`organization_id` varchar(36),
	`team_id` varchar(36),
	CONSTRAINT `user_id` PRIMARY KEY(`id`),
	CONSTRAINT `user_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `verification` (
	`id` varchar(36) NOT NULL,
	`identifier` varchar(255) NOT NULL,
	`value` text NOT NULL,
	`expires_at` timestamp(3) NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `verification_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` int AUTO_INCREMENT NOT NULL,
	`at` timestamp(3) NOT NULL DEFAULT (now()),
	`actor_id` varchar(36),
	`actor_email` varchar(255),
	`organization_id` varchar(36),
	`action` varchar(64) NOT NULL,
	`target_type` varchar(40) NOT NULL,
	`target_id` varchar(64) NOT NULL,
	`reason` text,
	`ip` varchar(64),
	`details` json,
	CONSTRAINT `audit_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `mail_log` (
	`id` int AUTO_INCREMENT NOT NULL,
	`at` timestamp(3) NOT NULL DEFAULT (now()),
	`to` varchar(255) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`status` varchar(12) NOT NULL,
	`error` text,
	`body` text,
	CONSTRAINT `mail_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `organization` (
	`id` varchar(36) NOT NULL,
	`name` varchar(200) NOT NULL,
	`kind` varchar(20) NOT NULL DEFAULT 'contractor',
	`seats` int NOT NULL DEFAULT 3,
	`trial_ends_at` datetime,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `organization_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `team` (
	`id` varchar(36) NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `team_id` PRIMARY KEY(`id`),
	CONSTRAINT `team_org_name_uq` UNIQUE(`organization_id`,`name`)
);
--> statement-breakpoint
CREATE TABLE `catalog_card` (
	`id` int AUTO_INCREMENT NOT NULL,
	`slug` varchar(80) NOT NULL,
	`title` varchar(200) NOT NULL,
	`retired_at` timestamp(3),
	`synced_at` timestamp(3) NOT NULL,
	CONSTRAINT `catalog_card_id` PRIMARY KEY(`id`),
	CONSTRAINT `catalog_card_slug_unique` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `catalog_lesson` (
	`id` int AUTO_INCREMENT NOT NULL,
	`module_id` int NOT NULL,
	`slug` varchar(80) NOT NULL,
	`title` varchar(200) NOT NULL,
	`minutes` int NOT NULL,
	`position` int NOT NULL,
	`retired_at` timestamp(3),
	`synced_at` timestamp(3) NOT NULL,
	CONSTRAINT `catalog_lesson_id` PRIMARY KEY(`id`),
	CONSTRAINT `lesson_module_slug_uq` UNIQUE(`module_id`,`slug`)
);
--> statement-breakpoint
CREATE TABLE `catalog_module` (
	`id` int AUTO_INCREMENT NOT NULL,
	`slug` varchar(80) NOT NULL,
	`title` varchar(200) NOT NULL,
	`position` int NOT NULL,
	`ce_hours` decimal(4,2) NOT NULL,
	`pass_mark` int NOT NULL,
	`validity_months` int NOT NULL,
	`quiz_rules` json NOT NULL,
	`required_skills` json NOT NULL,
	`retired_at` timestamp(3),
	`synced_at` timestamp(3) NOT NULL,
	CONSTRAINT `catalog_module_id` PRIMARY KEY(`id`),
	CONSTRAINT `catalog_module_slug_unique` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `catalog_path` (
	`id` int AUTO_INCREMENT NOT NULL,
	`slug` varchar(80) NOT NULL,
	`title` varchar(200) NOT NULL,
	`module_slugs` json NOT NULL,
	`validity_months` int NOT NULL,
	`retired_at` timestamp(3),
	`synced_at` timestamp(3) NOT NULL,
	CONSTRAINT `catalog_path_id` PRIMARY KEY(`id`),
	CONSTRAINT `catalog_path_slug_unique` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `content_sync` (
	`id` int AUTO_INCREMENT NOT NULL,
	`at` timestamp(3) NOT NULL DEFAULT (now()),
	`ok` boolean NOT NULL,
	`counts` json NOT NULL,
	`problems` text,
	CONSTRAINT `content_sync_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `lesson_progress` (
	`user_id` varchar(36) NOT NULL,
	`lesson_id` int NOT NULL,
	`completed_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `lesson_progress_user_id_lesson_id_pk` PRIMARY KEY(`user_id`,`lesson_id`)
);
--> statement-breakpoint
CREATE TABLE `module_completion` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`module_slug` varchar(80) NOT NULL,
	`attempt_id` varchar(36) NOT NULL,
	`completed_at` datetime(3) NOT NULL,
	`note` text,
	CONSTRAINT `module_completion_id` PRIMARY KEY(`id`),
	CONSTRAINT `completion_attempt_uq` UNIQUE(`attempt_id`)
);
--> statement-breakpoint
CREATE TABLE `quiz_question_version` (
	`id` int AUTO_INCREMENT NOT NULL,
	`module_slug` varchar(80) NOT NULL,
	`question_id` varchar(80) NOT NULL,
	`version` int NOT NULL,
	`hash` varchar(64) NOT NULL,
	`body` json NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`retired_at` timestamp(3),
	CONSTRAINT `quiz_question_version_id` PRIMARY KEY(`id`),
	CONSTRAINT `qv_question_version_uq` UNIQUE(`question_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `quiz_attempt` (
	`id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`organization_id` varchar(36),
	`module_slug` varchar(80) NOT NULL,
	`seed` int unsigned NOT NULL,
	`status` varchar(10) NOT NULL DEFAULT 'open',
	`started_at` datetime(3) NOT NULL,
	`deadline_at` datetime(3),
	`submitted_at` datetime(3),
	`score` int,
	`passed` boolean,
	`pass_mark` int NOT NULL,
	`late_graded` boolean NOT NULL DEFAULT false,
	CONSTRAINT `quiz_attempt_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `quiz_attempt_item` (
	`attempt_id` varchar(36) NOT NULL,
	`position` int NOT NULL,
	`question_version_id` int NOT NULL,
	`option_order` json,
	`params` json,
	`answer` json,
	`correct` boolean,
	CONSTRAINT `quiz_attempt_item_attempt_id_position_pk` PRIMARY KEY(`attempt_id`,`position`)
);
--> statement-breakpoint
CREATE TABLE `certificate` (
	`id` int AUTO_INCREMENT NOT NULL,
	`serial` varchar(20) NOT NULL,
	`serial_year` int NOT NULL,
	`serial_number` int NOT NULL,
	`verification_code` varbinary(32) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`holder_name` varchar(200) NOT NULL,
	`organization_id` varchar(36),
	`organization_name` varchar(200),
	`kind` varchar(10) NOT NULL,
	`subject_slug` varchar(80) NOT NULL,
	`subject_title` varchar(200) NOT NULL,
	`ce_hours` decimal(5,2) NOT NULL,
	`completion_id` int NOT NULL,
	`issued_at` datetime(3) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`renews_certificate_id` int,
	`reminder_sent_at` datetime(3),
	`revoked_at` datetime(3),
	`revoked_by` varchar(36),
	`revoke_reason` text,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `certificate_id` PRIMARY KEY(`id`),
	CONSTRAINT `cert_serial_uq` UNIQUE(`serial`),
	CONSTRAINT `cert_year_number_uq` UNIQUE(`serial_year`,`serial_number`),
	CONSTRAINT `cert_code_uq` UNIQUE(`verification_code`),
	CONSTRAINT `cert_completion_uq` UNIQUE(`completion_id`,`kind`,`subject_slug`)
);
--> statement-breakpoint
CREATE TABLE `certificate_serial_counter` (
	`year` int NOT NULL,
	`last_number` int NOT NULL DEFAULT 0,
	CONSTRAINT `certificate_serial_counter_year` PRIMARY KEY(`year`)
);
--> statement-breakpoint
CREATE TABLE `rate_limit_bucket` (
	`bucket_key` varchar(120) NOT NULL,
	`window_start` bigint NOT NULL,
	`hits` int NOT NULL DEFAULT 0,
	CONSTRAINT `rate_bucket_pk` PRIMARY KEY(`bucket_key`,`window_start`)
);
--> statement-breakpoint
CREATE TABLE `assignment` (
	`id` int AUTO_INCREMENT NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`kind` varchar(10) NOT NULL,
	`target_slug` varchar(80) NOT NULL,
	`user_id` varchar(36),
	`team_id` varchar(36),
	`target_key` varchar(40) NOT NULL,
	`due_at` datetime NOT NULL,
	`created_by` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `assignment_id` PRIMARY KEY(`id`),
	CONSTRAINT `assignment_item_target_uq` UNIQUE(`organization_id`,`kind`,`target_slug`,`target_key`)
);
--> statement-breakpoint
CREATE TABLE `invitation` (
	`id` varchar(36) NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`team_id` varchar(36),
	`email` varchar(255) NOT NULL,
	`name` varchar(200),
	`role` varchar(20) NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`invited_by` varchar(36),
	`created_at` datetime(3) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`accepted_user_id` varchar(36),
	`revoked_at` datetime(3),
	CONSTRAINT `invitation_id` PRIMARY KEY(`id`),
	CONSTRAINT `invitation_token_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `reminder_log` (
	`id` int AUTO_INCREMENT NOT NULL,
	`kind` varchar(20) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`period_key` varchar(80) NOT NULL,
	`sent_at` datetime(3) NOT NULL,
	CONSTRAINT `reminder_log_id` PRIMARY KEY(`id`),
	CONSTRAINT `reminder_once_uq` UNIQUE(`kind`,`user_id`,`period_key`)
);
--> statement-breakpoint
CREATE TABLE `checkout` (
	`id` varchar(36) NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`requested_by` varchar(36),
	`requested_by_email` varchar(255) NOT NULL,
	`requested_by_name` varchar(200) NOT NULL,
	`seats` int NOT NULL,
	`plan` varchar(40) NOT NULL,
	`unit_amount` int NOT NULL,
	`amount` int NOT NULL,
	`currency` varchar(3) NOT NULL,
	`idempotency_key` varchar(64) NOT NULL,
	`provider_session_id` varchar(255),
	`provider_url` text,
	`status` varchar(12) NOT NULL,
	`last_error` text,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	`paid_at` datetime(3),
	CONSTRAINT `checkout_id` PRIMARY KEY(`id`),
	CONSTRAINT `checkout_org_key_uq` UNIQUE(`organization_id`,`idempotency_key`),
	CONSTRAINT `checkout_session_uq` UNIQUE(`provider_session_id`)
);
--> statement-breakpoint
CREATE TABLE `payment_event` (
	`id` int AUTO_INCREMENT NOT NULL,
	`provider_event_id` varchar(255) NOT NULL,
	`type` varchar(64) NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`checkout_id` varchar(36) NOT NULL,
	`provider_session_id` varchar(255) NOT NULL,
	`outcome` varchar(20) NOT NULL,
	`seats_added` int NOT NULL DEFAULT 0,
	`seats_before` int,
	`seats_after` int,
	`amount` int,
	`currency` varchar(3),
	`event_created_at` datetime(3) NOT NULL,
	`processed_at` datetime(3) NOT NULL,
	CONSTRAINT `payment_event_id` PRIMARY KEY(`id`),
	CONSTRAINT `payment_event_provider_uq` UNIQUE(`provider_event_id`)
);
--> statement-breakpoint
CREATE TABLE `sign_off` (
	`id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`organization_id` varchar(36),
	`module_slug` varchar(80) NOT NULL,
	`skill_id` varchar(80) NOT NULL,
	`status` varchar(10) NOT NULL DEFAULT 'submitted',
	`note` text,
	`active_key` varchar(200),
	`submitted_at` datetime(3) NOT NULL,
	`reviewer_id` varchar(36),
	`review_comment` text,
	`reviewed_at` datetime(3),
	CONSTRAINT `sign_off_id` PRIMARY KEY(`id`),
	CONSTRAINT `sign_off_active_uq` UNIQUE(`active_key`)
);
--> statement-breakpoint
CREATE TABLE `sign_off_evidence` (
	`id` varchar(36) NOT NULL,
	`sign_off_id` varchar(36) NOT NULL,
	`position` int NOT NULL,
	`object_key` varchar(300) NOT NULL,
	`thumbnail_key` varchar(300),
	`content_type` varchar(60) NOT NULL,
	`size` int NOT NULL,
	`original_name` varchar(160) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sign_off_evidence_id` PRIMARY KEY(`id`),
	CONSTRAINT `sign_off_ev_object_uq` UNIQUE(`object_key`),
	CONSTRAINT `sign_off_ev_thumb_uq` UNIQUE(`thumbnail_key`)
);
--> statement-breakpoint
ALTER TABLE `account` ADD CONSTRAINT `account_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `session` ADD CONSTRAINT `session_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `team` ADD CONSTRAINT `team_organization_id_organization_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `catalog_lesson` ADD CONSTRAINT `catalog_lesson_module_id_catalog_module_id_fk` FOREIGN KEY (`module_id`) REFERENCES `catalog_module`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lesson_progress` ADD CONSTRAINT `lesson_progress_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lesson_progress` ADD CONSTRAINT `lesson_progress_lesson_id_catalog_lesson_id_fk` FOREIGN KEY (`lesson_id`) REFERENCES `catalog_lesson`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `module_completion` ADD CONSTRAINT `module_completion_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `quiz_attempt` ADD CONSTRAINT `quiz_attempt_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `quiz_attempt_item` ADD CONSTRAINT `quiz_attempt_item_attempt_id_quiz_attempt_id_fk` FOREIGN KEY (`attempt_id`) REFERENCES `quiz_attempt`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `quiz_attempt_item` ADD CONSTRAINT `attempt_item_version_fk` FOREIGN KEY (`question_version_id`) REFERENCES `quiz_question_version`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `certificate` ADD CONSTRAINT `cert_renews_fk` FOREIGN KEY (`renews_certificate_id`) REFERENCES `certificate`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `assignment` ADD CONSTRAINT `assignment_organization_id_organization_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `assignment` ADD CONSTRAINT `assignment_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `assignment` ADD CONSTRAINT `assignment_team_id_team_id_fk` FOREIGN KEY (`team_id`) REFERENCES `team`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitation` ADD CONSTRAINT `invitation_organization_id_organization_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `checkout` ADD CONSTRAINT `checkout_organization_id_organization_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_off` ADD CONSTRAINT `sign_off_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_off_evidence` ADD CONSTRAINT `sign_off_evidence_sign_off_id_sign_off_id_fk` FOREIGN KEY (`sign_off_id`) REFERENCES `sign_off`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `account_user_idx` ON `account` (`user_id`);--> statement-breakpoint
CREATE INDEX `session_user_idx` ON `session` (`user_id`);--> statement-breakpoint
CREATE INDEX `user_org_idx` ON `user` (`organization_id`,`team_id`);--> statement-breakpoint
CREATE INDEX `user_org_name_idx` ON `user` (`organization_id`,`name`);--> statement-breakpoint
CREATE INDEX `verification_identifier_idx` ON `verification` (`identifier`);--> statement-breakpoint
CREATE INDEX `audit_at_idx` ON `audit_log` (`at`);--> statement-breakpoint
CREATE INDEX `audit_org_idx` ON `audit_log` (`organization_id`,`at`);--> statement-breakpoint
CREATE INDEX `mail_at_idx` ON `mail_log` (`at`);--> statement-breakpoint
CREATE INDEX `progress_lesson_idx` ON `lesson_progress` (`lesson_id`);--> statement-breakpoint
CREATE INDEX `completion_user_idx` ON `module_completion` (`user_id`,`module_slug`);--> statement-breakpoint
CREATE INDEX `qv_module_idx` ON `quiz_question_version` (`module_slug`);--> statement-breakpoint
CREATE INDEX `attempt_user_module_idx` ON `quiz_attempt` (`user_id`,`module_slug`,`started_at`);--> statement-breakpoint
CREATE INDEX `attempt_org_idx` ON `quiz_attempt` (`organization_id`,`module_slug`);--> statement-breakpoint
CREATE INDEX `cert_holder_idx` ON `certificate` (`user_id`,`kind`,`subject_slug`,`issued_at`);--> statement-breakpoint
CREATE INDEX `cert_org_expiry_idx` ON `certificate` (`organization_id`,`expires_at`);--> statement-breakpoint
CREATE INDEX `cert_expiry_idx` ON `certificate` (`expires_at`);--> statement-breakpoint
CREATE INDEX `cert_renews_idx` ON `certificate` (`renews_certificate_id`);--> statement-breakpoint
CREATE INDEX `rate_bucket_window_idx` ON `rate_limit_bucket` (`window_start`);--> statement-breakpoint
CREATE INDEX `assignment_user_idx` ON `assignment` (`user_id`,`due_at`);--> statement-breakpoint
CREATE INDEX `assignment_team_idx` ON `assignment` (`team_id`,`due_at`);--> statement-breakpoint
CREATE INDEX `assignment_org_due_idx` ON `assignment` (`organization_id`,`due_at`);--> statement-breakpoint
CREATE INDEX `invitation_org_email_idx` ON `invitation` (`organization_id`,`email`);--> statement-breakpoint
CREATE INDEX `invitation_org_open_idx` ON `invitation` (`organization_id`,`accepted_at`,`revoked_at`,`expires_at`);--> statement-breakpoint
CREATE INDEX `checkout_org_created_idx` ON `checkout` (`organization_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `payment_event_org_idx` ON `payment_event` (`organization_id`,`processed_at`);--> statement-breakpoint
CREATE INDEX `payment_event_checkout_idx` ON `payment_event` (`checkout_id`);--> statement-breakpoint
CREATE INDEX `sign_off_queue_idx` ON `sign_off` (`organization_id`,`status`,`submitted_at`);--> statement-breakpoint
CREATE INDEX `sign_off_user_idx` ON `sign_off` (`user_id`,`module_slug`,`skill_id`);--> statement-breakpoint
CREATE INDEX `sign_off_ev_parent_idx` ON `sign_off_evidence` (`sign_off_id`,`position`);