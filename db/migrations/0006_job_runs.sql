CREATE TABLE `job_lease` (
	`job` varchar(60) NOT NULL,
	`run_id` varchar(36),
	`lease_until` datetime(3) NOT NULL,
	CONSTRAINT `job_lease_job` PRIMARY KEY(`job`)
);
--> statement-breakpoint
CREATE TABLE `job_run` (
	`id` int AUTO_INCREMENT NOT NULL,
	`run_id` varchar(36) NOT NULL,
	`job` varchar(60) NOT NULL,
	`host` varchar(120) NOT NULL,
	`trigger` varchar(20) NOT NULL,
	`status` varchar(12) NOT NULL,
	`started_at` datetime(3) NOT NULL,
	`finished_at` datetime(3),
	`result` json,
	`error` text,
	CONSTRAINT `job_run_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE INDEX `job_run_job_started_idx` ON `job_run` (`job`,`started_at`);--> statement-breakpoint
CREATE INDEX `job_run_started_idx` ON `job_run` (`started_at`);