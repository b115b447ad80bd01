CREATE TABLE `comparison` (
	`id` varchar(40) NOT NULL,
	`owner_id` varchar(40) NOT NULL,
	`title` varchar(160) NOT NULL,
	`items` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `comparison_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `notification` (
	`id` varchar(40) NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`kind` enum('review_requested','verdict','comment') NOT NULL,
	`review_id` varchar(40),
	`build_id` varchar(40),
	`text` varchar(500) NOT NULL,
	`read_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `notification_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `review_comment` (
	`id` varchar(40) NOT NULL,
	`review_id` varchar(40) NOT NULL,
	`author_id` varchar(40) NOT NULL,
	`anchor_kind` enum('node','link','figure') NOT NULL,
	`anchor_key` varchar(120) NOT NULL,
	`body` varchar(4000) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `review_comment_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `review` (
	`id` varchar(40) NOT NULL,
	`build_id` varchar(40) NOT NULL,
	`revision_number` int NOT NULL,
	`requested_by` varchar(40) NOT NULL,
	`reviewer_id` varchar(40) NOT NULL,
	`status` enum('requested','approved','changes_requested','rejected') NOT NULL DEFAULT 'requested',
	`message` varchar(2000) NOT NULL DEFAULT '',
	`summary` varchar(4000) NOT NULL DEFAULT '',
	`created_at` datetime(3) NOT NULL,
	`decided_at` datetime(3),
	CONSTRAINT `review_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `share_link` (
	`id` varchar(40) NOT NULL,
	`build_id` varchar(40) NOT NULL,
	`revision_number` int NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`created_by` varchar(40) NOT NULL,
	`expires_at` datetime(3),
	`revoked_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `share_link_id` PRIMARY KEY(`id`),
	CONSTRAINT `share_link_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
ALTER TABLE `comparison` ADD CONSTRAINT `comparison_owner_id_user_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `notification` ADD CONSTRAINT `notification_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `notification` ADD CONSTRAINT `notification_review_id_review_id_fk` FOREIGN KEY (`review_id`) REFERENCES `review`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `notification` ADD CONSTRAINT `notification_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comment` ADD CONSTRAINT `review_comment_review_id_review_id_fk` FOREIGN KEY (`review_id`) REFERENCES `review`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comment` ADD CONSTRAINT `review_comment_author_id_user_id_fk` FOREIGN KEY (`author_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review` ADD CONSTRAINT `review_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review` ADD CONSTRAINT `review_requested_by_user_id_fk` FOREIGN KEY (`requested_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review` ADD CONSTRAINT `review_reviewer_id_user_id_fk` FOREIGN KEY (`reviewer_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `share_link` ADD CONSTRAINT `share_link_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `share_link` ADD CONSTRAINT `share_link_created_by_user_id_fk` FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `comparison_owner_idx` ON `comparison` (`owner_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `notification_user_idx` ON `notification` (`user_id`,`read_at`,`created_at`);--> statement-breakpoint
CREATE INDEX `review_comment_review_idx` ON `review_comment` (`review_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `review_reviewer_status_idx` ON `review` (`reviewer_id`,`status`,`created_at`);--> statement-breakpoint
CREATE INDEX `review_requested_by_idx` ON `review` (`requested_by`,`created_at`);--> statement-breakpoint
CREATE INDEX `review_build_idx` ON `review` (`build_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `share_link_build_idx` ON `share_link` (`build_id`,`created_at`);