CREATE TABLE `part_verification` (
	`part_id` varchar(40) NOT NULL,
	`verified_by` varchar(40) NOT NULL,
	`verified_at` datetime(3) NOT NULL,
	`against` varchar(500) NOT NULL,
	`attachment_id` varchar(40),
	CONSTRAINT `part_verification_part_id` PRIMARY KEY(`part_id`)
);
--> statement-breakpoint
CREATE TABLE `revision_part_snapshot` (
	`revision_id` varchar(40) NOT NULL,
	`part_id` varchar(40) NOT NULL,
	`record` json NOT NULL,
	`taken_at` datetime(3) NOT NULL,
	CONSTRAINT `revision_part_snapshot_revision_id_part_id_pk` PRIMARY KEY(`revision_id`,`part_id`)
);
--> statement-breakpoint
CREATE TABLE `revision_solver_change` (
	`revision_id` varchar(40) NOT NULL,
	`solver_version` varchar(40) NOT NULL,
	`previous_version` varchar(40) NOT NULL,
	`changes` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `revision_solver_change_revision_id_solver_version_pk` PRIMARY KEY(`revision_id`,`solver_version`)
);
--> statement-breakpoint
ALTER TABLE `part_verification` ADD CONSTRAINT `part_verification_part_id_part_id_fk` FOREIGN KEY (`part_id`) REFERENCES `part`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `part_verification` ADD CONSTRAINT `part_verification_verified_by_user_id_fk` FOREIGN KEY (`verified_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `part_verification` ADD CONSTRAINT `part_verification_attachment_id_part_attachment_id_fk` FOREIGN KEY (`attachment_id`) REFERENCES `part_attachment`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_part_snapshot` ADD CONSTRAINT `revision_part_snapshot_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_solver_change` ADD CONSTRAINT `revision_solver_change_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;