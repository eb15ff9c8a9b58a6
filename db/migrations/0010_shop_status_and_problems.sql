CREATE TABLE `problem_reports` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`description` varchar(1000) NOT NULL,
	`severity` enum('low','medium','high') NOT NULL,
	`stop_use` boolean NOT NULL DEFAULT false,
	`reported_by` varchar(24),
	`reported_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`closed_at` datetime(3),
	`closed_by` varchar(24),
	`close_reason` varchar(500),
	`service_entry_id` varchar(24),
	CONSTRAINT `problem_reports_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `shops` ADD `opening_hours` json;--> statement-breakpoint
ALTER TABLE `presses` ADD `status_token` varchar(24);--> statement-breakpoint
ALTER TABLE `presses` ADD CONSTRAINT `presses_status_token` UNIQUE(`status_token`);--> statement-breakpoint
ALTER TABLE `problem_reports` ADD CONSTRAINT `problem_reports_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `problem_reports` ADD CONSTRAINT `problem_reports_reported_by_users_id_fk` FOREIGN KEY (`reported_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `problem_reports` ADD CONSTRAINT `problem_reports_closed_by_users_id_fk` FOREIGN KEY (`closed_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `problem_reports` ADD CONSTRAINT `problem_reports_service_entry_id_service_entries_id_fk` FOREIGN KEY (`service_entry_id`) REFERENCES `service_entries`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `problem_reports_press_idx` ON `problem_reports` (`press_id`,`closed_at`,`reported_at`);--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_problem_report_id_problem_reports_id_fk` FOREIGN KEY (`problem_report_id`) REFERENCES `problem_reports`(`id`) ON DELETE set null ON UPDATE no action;