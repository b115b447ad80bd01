CREATE TABLE `review_share_link` (
	`id` varchar(40) NOT NULL,
	`review_id` varchar(40) NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`created_by` varchar(40) NOT NULL,
	`expires_at` datetime(3),
	`revoked_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `review_share_link_id` PRIMARY KEY(`id`),
	CONSTRAINT `review_share_link_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
ALTER TABLE `review_share_link` ADD CONSTRAINT `review_share_link_review_id_review_id_fk` FOREIGN KEY (`review_id`) REFERENCES `review`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_share_link` ADD CONSTRAINT `review_share_link_created_by_user_id_fk` FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `review_share_link_review_idx` ON `review_share_link` (`review_id`,`created_at`);