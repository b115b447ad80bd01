CREATE TABLE `build_member` (
	`build_id` varchar(40) NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`can_edit` boolean NOT NULL DEFAULT false,
	CONSTRAINT `build_member_build_id_user_id_pk` PRIMARY KEY(`build_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `build_revision` (
	`id` varchar(40) NOT NULL,
	`build_id` varchar(40) NOT NULL,
	`number` int NOT NULL,
	`design` json NOT NULL,
	`note` varchar(500) NOT NULL DEFAULT '',
	`created_by` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `build_revision_id` PRIMARY KEY(`id`),
	CONSTRAINT `build_revision_number_unique` UNIQUE(`build_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `build` (
	`id` varchar(40) NOT NULL,
	`owner_id` varchar(40) NOT NULL,
	`title` varchar(160) NOT NULL,
	`summary` varchar(2000) NOT NULL DEFAULT '',
	`visibility` enum('private','shared') NOT NULL DEFAULT 'private',
	`variant_of` varchar(40),
	`variant_note` varchar(500),
	`current_revision` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `build_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `revision_part` (
	`revision_id` varchar(40) NOT NULL,
	`part_id` varchar(40) NOT NULL,
	CONSTRAINT `revision_part_revision_id_part_id_pk` PRIMARY KEY(`revision_id`,`part_id`)
);
--> statement-breakpoint
CREATE TABLE `revision_result` (
	`revision_id` varchar(40) NOT NULL,
	`solver_version` varchar(40) NOT NULL,
	`result` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `revision_result_revision_id_solver_version_pk` PRIMARY KEY(`revision_id`,`solver_version`)
);
--> statement-breakpoint
ALTER TABLE `build_member` ADD CONSTRAINT `build_member_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_member` ADD CONSTRAINT `build_member_user_id_user_id_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_revision` ADD CONSTRAINT `build_revision_build_id_build_id_fk` FOREIGN KEY (`build_id`) REFERENCES `build`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_revision` ADD CONSTRAINT `build_revision_created_by_user_id_fk` FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build` ADD CONSTRAINT `build_owner_id_user_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_part` ADD CONSTRAINT `revision_part_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_part` ADD CONSTRAINT `revision_part_part_id_part_id_fk` FOREIGN KEY (`part_id`) REFERENCES `part`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_result` ADD CONSTRAINT `revision_result_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `build_member_user_idx` ON `build_member` (`user_id`);--> statement-breakpoint
CREATE INDEX `build_owner_updated_idx` ON `build` (`owner_id`,`updated_at`);--> statement-breakpoint
CREATE INDEX `build_visibility_updated_idx` ON `build` (`visibility`,`updated_at`);--> statement-breakpoint
CREATE INDEX `build_variant_of_idx` ON `build` (`variant_of`);--> statement-breakpoint
CREATE INDEX `revision_part_part_idx` ON `revision_part` (`part_id`);