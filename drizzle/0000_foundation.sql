CREATE TABLE `password_reset_token` (
	`token_hash` varchar(64) NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	CONSTRAINT `password_reset_token_token_hash` PRIMARY KEY(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `rate_limit` (
	`key` varchar(255) NOT NULL,
	`points` int NOT NULL DEFAULT 0,
	`expire` bigint unsigned,
	CONSTRAINT `rate_limit_key` PRIMARY KEY(`key`)
);
--> statement-breakpoint
CREATE TABLE `user_session` (
	`id` varchar(255) NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`expires_at` datetime NOT NULL,
	CONSTRAINT `user_session_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `user` (
	`id` varchar(40) NOT NULL,
	`email` varchar(254) NOT NULL,
	`display_name` varchar(120) NOT NULL,
	`password_hash` varchar(255) NOT NULL,
	`role` enum('maker','reviewer','instructor','admin') NOT NULL DEFAULT 'maker',
	`length_units` enum('metric','imperial') NOT NULL DEFAULT 'metric',
	`temperature_unit` enum('C','F') NOT NULL DEFAULT 'C',
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `user_id` PRIMARY KEY(`id`),
	CONSTRAINT `user_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
ALTER TABLE `password_reset_token` ADD CONSTRAINT `password_reset_token_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `user_session` ADD CONSTRAINT `user_session_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `password_reset_user_idx` ON `password_reset_token` (`user_id`);--> statement-breakpoint
CREATE INDEX `user_session_user_idx` ON `user_session` (`user_id`);