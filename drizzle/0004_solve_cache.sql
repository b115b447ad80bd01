CREATE TABLE `solve_cache` (
	`revision_id` varchar(40) NOT NULL,
	`cache_key` varchar(40) NOT NULL,
	`result` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `solve_cache_revision_id_cache_key_pk` PRIMARY KEY(`revision_id`,`cache_key`)
);
--> statement-breakpoint
DROP TABLE `revision_result`;--> statement-breakpoint
ALTER TABLE `solve_cache` ADD CONSTRAINT `solve_cache_revision_id_build_revision_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `build_revision`(`id`) ON DELETE cascade ON UPDATE no action;