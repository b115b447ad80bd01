CREATE TABLE `class_invitation` (
	`id` varchar(40) NOT NULL,
	`class_id` varchar(40) NOT NULL,
	`email` varchar(254) NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`invited_by` varchar(40) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`used_by` varchar(40),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `class_invitation_id` PRIMARY KEY(`id`),
	CONSTRAINT `class_invitation_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `class_member` (
	`class_id` varchar(40) NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`role` enum('instructor','student') NOT NULL,
	`joined_at` datetime(3) NOT NULL,
	CONSTRAINT `class_member_class_id_user_id_pk` PRIMARY KEY(`class_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `class` (
	`id` varchar(40) NOT NULL,
	`name` varchar(120) NOT NULL,
	`term` varchar(80) NOT NULL DEFAULT '',
	`join_code` varchar(16) NOT NULL,
	`created_by` varchar(40) NOT NULL,
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `class_id` PRIMARY KEY(`id`),
	CONSTRAINT `class_join_code_unique` UNIQUE(`join_code`)
);
--> statement-breakpoint
CREATE TABLE `exercise_copy` (
	`exercise_id` varchar(40) NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`build_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `exercise_copy_exercise_id_user_id_pk` PRIMARY KEY(`exercise_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `exercise` (
	`id` varchar(40) NOT NULL,
	`class_id` varchar(40) NOT NULL,
	`title` varchar(160) NOT NULL,
	`instructions` text NOT NULL,
	`starter_build_id` varchar(40) NOT NULL,
	`starter_revision` int NOT NULL,
	`due_at` datetime(3) NOT NULL,
	`created_by` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `exercise_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `handin` (
	`id` varchar(40) NOT NULL,
	`exercise_id` varchar(40) NOT NULL,
	`student_id` varchar(40) NOT NULL,
	`build_id` varchar(40) NOT NULL,
	`revision_number` int NOT NULL,
	`late` boolean NOT NULL,
	`submitted_at` datetime(3) NOT NULL,
	`feedback` text,
	`mark` varchar(40),
	`feedback_by` varchar(40),
	`feedback_at` datetime(3),
	CONSTRAINT `handin_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `worked_example` (
	`id` varchar(40) NOT NULL,
	`class_id` varchar(40) NOT NULL,
	`title` varchar(160) NOT NULL,
	`narrative` text NOT NULL,
	`build_id` varchar(40) NOT NULL,
	`revision_id` varchar(40) NOT NULL,
	`revision_number` int NOT NULL,
	`scenario_id` varchar(80),
	`hidden` json NOT NULL,
	`tolerance_percent` double NOT NULL DEFAULT 2,
	`reveal_at` datetime(3),
	`revealed_at` datetime(3),
	`visibility` enum('class','link') NOT NULL DEFAULT 'class',
	`link_token_hash` varchar(64),
	`created_by` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `worked_example_id` PRIMARY KEY(`id`),
	CONSTRAINT `worked_example_link_unique` UNIQUE(`link_token_hash`)
);
--> statement-breakpoint
ALTER TABLE `notification` MODIFY COLUMN `kind` enum('review_requested','verdict','comment','feedback') NOT NULL;--> statement-breakpoint
ALTER TABLE `notification` ADD `href` varchar(300);--> statement-breakpoint
ALTER TABLE `class_invitation` ADD CONSTRAINT `class_invitation_class_id_class_id_fk` FOREIGN KEY (`class_id`) REFERENCES `class`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `class_invitation` ADD CONSTRAINT `class_invitation_invited_by_user_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `class_invitation` ADD CONSTRAINT `class_invitation_used_by_user_id_fk` FOREIGN KEY (`used_by`) REFERENCES `user`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `class_member` ADD CONSTRAINT `class_member_class_id_class_id_fk` FOREIGN KEY (`class_id`) REFERENCES `class`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `class_member` ADD CONSTRAINT `class_member_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `class` ADD CONSTRAINT `class_created_by_user_id_fk` FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `exercise_copy` ADD CONSTRAINT `exercise_copy_exercise_id_exercise_id_fk` FOREIGN KEY (`exercise_id`) REFERENCES `exercise`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `exercise_copy` ADD CONSTRAINT `exercise_copy_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `exercise_copy` ADD CONSTRAINT `exercise_copy_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `exercise` ADD CONSTRAINT `exercise_class_id_class_id_fk` FOREIGN KEY (`class_id`) REFERENCES `class`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `exercise` ADD CONSTRAINT `exercise_starter_build_id_build_id_fk` FOREIGN KEY (`starter_build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `exercise` ADD CONSTRAINT `exercise_created_by_user_id_fk` FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `handin` ADD CONSTRAINT `handin_exercise_id_exercise_id_fk` FOREIGN KEY (`exercise_id`) REFERENCES `exercise`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `handin` ADD CONSTRAINT `handin_student_id_user_id_fk` FOREIGN KEY (`student_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `handin` ADD CONSTRAINT `handin_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `handin` ADD CONSTRAINT `handin_feedback_by_user_id_fk` FOREIGN KEY (`feedback_by`) REFERENCES `user`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `worked_example` ADD CONSTRAINT `worked_example_class_id_class_id_fk` FOREIGN KEY (`class_id`) REFERENCES `class`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `worked_example` ADD CONSTRAINT `worked_example_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `worked_example` ADD CONSTRAINT `worked_example_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `worked_example` ADD CONSTRAINT `worked_example_created_by_user_id_fk` FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `class_invitation_class_idx` ON `class_invitation` (`class_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `class_member_user_idx` ON `class_member` (`user_id`);--> statement-breakpoint
CREATE INDEX `exercise_class_idx` ON `exercise` (`class_id`,`due_at`);--> statement-breakpoint
CREATE INDEX `exercise_starter_idx` ON `exercise` (`starter_build_id`);--> statement-breakpoint
CREATE INDEX `handin_exercise_student_idx` ON `handin` (`exercise_id`,`student_id`,`submitted_at`);--> statement-breakpoint
CREATE INDEX `handin_build_idx` ON `handin` (`build_id`);--> statement-breakpoint
CREATE INDEX `worked_example_class_idx` ON `worked_example` (`class_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `worked_example_build_idx` ON `worked_example` (`build_id`);