CREATE TABLE `part_attachment` (
	`id` varchar(40) NOT NULL,
	`part_id` varchar(40) NOT NULL,
	`uploaded_by` varchar(40) NOT NULL,
	`object_key` varchar(200) NOT NULL,
	`filename` varchar(200) NOT NULL,
	`content_type` varchar(100) NOT NULL,
	`size_bytes` int NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `part_attachment_id` PRIMARY KEY(`id`),
	CONSTRAINT `part_attachment_key_unique` UNIQUE(`object_key`)
);
--> statement-breakpoint
CREATE TABLE `part` (
	`id` varchar(40) NOT NULL,
	`owner_id` varchar(40) NOT NULL,
	`kind` enum('emitter','driver','heatsink','interface','spreader','housing','cell','charger','protection') NOT NULL,
	`name` varchar(120) NOT NULL,
	`provenance` enum('datasheet','measured','estimate') NOT NULL,
	`provenance_note` varchar(1000),
	`visibility` enum('private','shared','public') NOT NULL DEFAULT 'private',
	`cost_eur` double,
	`verified` boolean NOT NULL DEFAULT false,
	`specs` json NOT NULL,
	`curves` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `part_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `part_attachment` ADD CONSTRAINT `part_attachment_part_id_part_id_fk` FOREIGN KEY (`part_id`) REFERENCES `part`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `part_attachment` ADD CONSTRAINT `part_attachment_uploaded_by_user_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `part` ADD CONSTRAINT `part_owner_id_user_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `part_attachment_part_idx` ON `part_attachment` (`part_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `part_kind_name_idx` ON `part` (`kind`,`name`);--> statement-breakpoint
CREATE INDEX `part_owner_kind_name_idx` ON `part` (`owner_id`,`kind`,`name`);--> statement-breakpoint
CREATE INDEX `part_visibility_kind_name_idx` ON `part` (`visibility`,`kind`,`name`);--> statement-breakpoint
CREATE INDEX `part_provenance_name_idx` ON `part` (`provenance`,`name`);--> statement-breakpoint
CREATE INDEX `part_name_idx` ON `part` (`name`);--> statement-breakpoint
CREATE INDEX `part_updated_idx` ON `part` (`updated_at`);