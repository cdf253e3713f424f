CREATE TABLE `totp_code_use` (
	`user_id` varchar(36) NOT NULL,
	`code_hash` varchar(64) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	CONSTRAINT `totp_code_use_user_id_code_hash_pk` PRIMARY KEY(`user_id`,`code_hash`)
);
--> statement-breakpoint
ALTER TABLE `totp_code_use` ADD CONSTRAINT `totp_code_use_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;