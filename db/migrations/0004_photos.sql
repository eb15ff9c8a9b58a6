CREATE TABLE `photos` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`component_id` varchar(24),
	`service_entry_id` varchar(24),
	`inspection_item_id` varchar(24),
	`problem_report_id` varchar(24),
	`kind` enum('weld','leak','damage','die','other') NOT NULL DEFAULT 'other',
	`caption` varchar(200),
	`uploaded_by` varchar(24),
	`file_key` varchar(128) NOT NULL,
	`file_url` varchar(512) NOT NULL,
	`width` int NOT NULL,
	`height` int NOT NULL,
	`bytes` int NOT NULL,
	`thumb_key` varchar(128) NOT NULL,
	`thumb_url` varchar(512) NOT NULL,
	`thumb_width` int NOT NULL,
	`thumb_height` int NOT NULL,
	`thumb_bytes` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `photos_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_component_id_components_id_fk` FOREIGN KEY (`component_id`) REFERENCES `components`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `photos_press_idx` ON `photos` (`press_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `photos_component_idx` ON `photos` (`component_id`);