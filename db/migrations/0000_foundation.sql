CREATE TABLE `login_throttle` (
	`scope` enum('ip','account') NOT NULL,
	`subject` varchar(254) NOT NULL,
	`failures` int NOT NULL DEFAULT 0,
	`last_failure_at` datetime(3) NOT NULL,
	`locked_until` datetime(3),
	CONSTRAINT `login_throttle_scope_subject_pk` PRIMARY KEY(`scope`,`subject`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`id` varchar(24) NOT NULL,
	`secret_hash` binary(32) NOT NULL,
	`user_id` varchar(24) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`last_verified_at` datetime(3) NOT NULL,
	CONSTRAINT `sessions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(24) NOT NULL,
	`email` varchar(254) NOT NULL,
	`display_name` varchar(80) NOT NULL,
	`password_hash` varchar(255) NOT NULL,
	`unit_system` enum('metric','imperial') NOT NULL DEFAULT 'metric',
	`active_shop_id` varchar(24),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `memberships` (
	`shop_id` varchar(24) NOT NULL,
	`user_id` varchar(24) NOT NULL,
	`role` enum('manager','inspector','member') NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `memberships_shop_id_user_id_pk` PRIMARY KEY(`shop_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `shops` (
	`id` varchar(24) NOT NULL,
	`name` varchar(100) NOT NULL,
	`time_zone` varchar(64) NOT NULL DEFAULT 'UTC',
	`personal` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `shops_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `presses` (
	`id` varchar(24) NOT NULL,
	`shop_id` varchar(24) NOT NULL,
	`name` varchar(100) NOT NULL,
	`frame_type` enum('h-frame','c-frame','four-post','other') NOT NULL,
	`lifecycle` enum('planned','building','in-service','retired') NOT NULL DEFAULT 'planned',
	`rated_force_kn` double,
	`daylight_mm` double,
	`stroke_mm` double,
	`bed_width_mm` double,
	`bed_depth_mm` double,
	`working_pressure_bar` double,
	`relief_pressure_bar` double,
	`hour_meter` double NOT NULL DEFAULT 0,
	`location` varchar(100),
	`notes` text,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `presses_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`action` varchar(64) NOT NULL,
	`user_id` varchar(24),
	`shop_id` varchar(24),
	`ip` varchar(64),
	`detail` json,
	CONSTRAINT `audit_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `presses` ADD CONSTRAINT `presses_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `sessions_user_idx` ON `sessions` (`user_id`);--> statement-breakpoint
CREATE INDEX `memberships_user_idx` ON `memberships` (`user_id`);--> statement-breakpoint
CREATE INDEX `presses_shop_idx` ON `presses` (`shop_id`);--> statement-breakpoint
CREATE INDEX `audit_user_idx` ON `audit_log` (`user_id`);--> statement-breakpoint
CREATE INDEX `audit_at_idx` ON `audit_log` (`at`);