ALTER TABLE `user` ADD `language` varchar(5) DEFAULT 'en' NOT NULL;--> statement-breakpoint
ALTER TABLE `organization` ADD `default_language` varchar(5) DEFAULT 'en' NOT NULL;--> statement-breakpoint
ALTER TABLE `invitation` ADD `language` varchar(5) DEFAULT 'en' NOT NULL;