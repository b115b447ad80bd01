CREATE TABLE `part_verification` (
	`part_id` varchar(40) NOT NULL,
	`verified_by` varchar(40) NOT NULL,
	`verified_at` datetime(3) NOT NULL,
	`against` varchar(500) NOT NULL,
	`attachment_id` varchar(40),
	CONSTRAINT `part_verification_part_id` PRIMARY KEY(`part_id`)
);
--> statement-breakpoint
ALTER TABLE `part_verification` ADD CONSTRAINT `part_verification_part_id_part_id_fk` FOREIGN KEY (`part_id`) REFERENCES `part`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `part_verification` ADD CONSTRAINT `part_verification_verified_by_user_id_fk` FOREIGN KEY (`verified_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `part_verification` ADD CONSTRAINT `part_verification_attachment_id_part_attachment_id_fk` FOREIGN KEY (`attachment_id`) REFERENCES `part_attachment`(`id`) ON DELETE set null ON UPDATE no action;