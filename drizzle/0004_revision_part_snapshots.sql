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
ALTER TABLE `revision_part_snapshot` ADD CONSTRAINT `revision_part_snapshot_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_solver_change` ADD CONSTRAINT `revision_solver_change_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;