CREATE TABLE `credential_status_entry` (
	`id` int AUTO_INCREMENT NOT NULL,
	`certificate_id` int NOT NULL,
	`salt` varchar(64) NOT NULL,
	`identity_hash` varchar(80) NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `credential_status_entry_id` PRIMARY KEY(`id`),
	CONSTRAINT `cred_status_cert_uq` UNIQUE(`certificate_id`)
);
--> statement-breakpoint
CREATE TABLE `credit_reporting_period` (
	`organization_id` varchar(36) NOT NULL,
	`start_year` int NOT NULL,
	`start_month` int NOT NULL,
	`length_months` int NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	`updated_by` varchar(36),
	CONSTRAINT `credit_reporting_period_organization_id` PRIMARY KEY(`organization_id`)
);
