CREATE TABLE `bench_run` (
	`id` varchar(40) NOT NULL,
	`owner_id` varchar(40) NOT NULL,
	`title` varchar(160) NOT NULL,
	`visibility` enum('private','shared') NOT NULL DEFAULT 'private',
	`powered_part_id` varchar(40),
	`powered_build_id` varchar(40),
	`powered_revision` int,
	`run` json NOT NULL,
	`fit` json,
	`fitted_part_id` varchar(40),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `bench_run_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `bench_run` ADD CONSTRAINT `bench_run_owner_id_user_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bench_run` ADD CONSTRAINT `bench_run_powered_part_id_part_id_fk` FOREIGN KEY (`powered_part_id`) REFERENCES `part`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bench_run` ADD CONSTRAINT `bench_run_powered_build_id_build_id_fk` FOREIGN KEY (`powered_build_id`) REFERENCES `build`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bench_run` ADD CONSTRAINT `bench_run_fitted_part_id_part_id_fk` FOREIGN KEY (`fitted_part_id`) REFERENCES `part`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `bench_run_owner_idx` ON `bench_run` (`owner_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `bench_run_visibility_idx` ON `bench_run` (`visibility`,`created_at`);--> statement-breakpoint
CREATE INDEX `bench_run_fitted_part_idx` ON `bench_run` (`fitted_part_id`);