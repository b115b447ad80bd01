CREATE TABLE `signup_request` (
	`token_hash` varchar(64) NOT NULL,
	`email` varchar(254) NOT NULL,
	`display_name` varchar(120) NOT NULL,
	`password_hash` varchar(255) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	CONSTRAINT `signup_request_token_hash` PRIMARY KEY(`token_hash`)
);
--> statement-breakpoint
CREATE INDEX `signup_request_email_idx` ON `signup_request` (`email`);