CREATE TABLE `build_invitation` (
	`build_id` varchar(40) NOT NULL,
	`email` varchar(254) NOT NULL,
	`can_edit` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `build_invitation_build_id_email_pk` PRIMARY KEY(`build_id`,`email`)
);
--> statement-breakpoint
CREATE TABLE `signup_request` (
	`token_hash` varchar(64) NOT NULL,
	`email` varchar(254) NOT NULL,
	`display_name` varchar(120) NOT NULL,
	`password_hash` varchar(255) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	CONSTRAINT `signup_request_token_hash` PRIMARY KEY(`token_hash`)
);
--> statement-breakpoint
ALTER TABLE `build_invitation` ADD CONSTRAINT `build_invitation_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `build_invitation_email_idx` ON `build_invitation` (`email`);--> statement-breakpoint
CREATE INDEX `signup_request_email_idx` ON `signup_request` (`email`);