CREATE TABLE `signup_intent` (
	`user_id` varchar(36) NOT NULL,
	`nonce_hash` varchar(64) NOT NULL,
	`created_at` datetime NOT NULL,
	CONSTRAINT `signup_intent_user_id` PRIMARY KEY(`user_id`)
);
--> statement-breakpoint
ALTER TABLE `signup_intent` ADD CONSTRAINT `signup_intent_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;