CREATE TABLE `service_entries` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`kind` enum('hose-replaced','filter-changed','oil-changed','oil-topped-up','oil-sample','relief-checked','leak-fixed','weld-repaired','die-changed','other') NOT NULL,
	`performed_on` date NOT NULL,
	`hours` double,
	`parts` json NOT NULL,
	`component_id` varchar(24),
	`installed_component_id` varchar(24),
	`cost_cents` int,
	`iso4406` varchar(8),
	`relief_found_bar` double,
	`relief_set_bar` double,
	`notes` text,
	`performed_by` varchar(24),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `service_entries_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `service_entry_revisions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`entry_id` varchar(24) NOT NULL,
	`changed_by` varchar(24),
	`changed_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`changes` json NOT NULL,
	CONSTRAINT `service_entry_revisions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `service_tasks` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`title` varchar(100) NOT NULL,
	`kind` enum('hose-replaced','filter-changed','oil-changed','oil-topped-up','oil-sample','relief-checked','leak-fixed','weld-repaired','die-changed','other') NOT NULL,
	`interval_days` int,
	`interval_hours` double,
	`last_done_on` date NOT NULL,
	`last_done_hours` double NOT NULL DEFAULT 0,
	`last_entry_id` varchar(24),
	`from_starting_plan` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `service_tasks_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `invitations` (
	`id` varchar(24) NOT NULL,
	`shop_id` varchar(24) NOT NULL,
	`email` varchar(254) NOT NULL,
	`role` enum('manager','inspector','member') NOT NULL,
	`secret_hash` binary(32) NOT NULL,
	`invited_by` varchar(24),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`expires_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`accepted_by` varchar(24),
	`revoked_at` datetime(3),
	CONSTRAINT `invitations_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `password_resets` (
	`id` varchar(24) NOT NULL,
	`user_id` varchar(24) NOT NULL,
	`secret_hash` binary(32) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	CONSTRAINT `password_resets_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `service_entries` ADD CONSTRAINT `service_entries_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `service_entries` ADD CONSTRAINT `service_entries_component_id_components_id_fk` FOREIGN KEY (`component_id`) REFERENCES `components`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `service_entries` ADD CONSTRAINT `service_entries_installed_component_id_components_id_fk` FOREIGN KEY (`installed_component_id`) REFERENCES `components`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `service_entries` ADD CONSTRAINT `service_entries_performed_by_users_id_fk` FOREIGN KEY (`performed_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `service_entry_revisions` ADD CONSTRAINT `service_entry_revisions_entry_id_service_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `service_entries`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `service_entry_revisions` ADD CONSTRAINT `service_entry_revisions_changed_by_users_id_fk` FOREIGN KEY (`changed_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `service_tasks` ADD CONSTRAINT `service_tasks_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_accepted_by_users_id_fk` FOREIGN KEY (`accepted_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `password_resets` ADD CONSTRAINT `password_resets_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `service_entries_press_idx` ON `service_entries` (`press_id`,`performed_on`,`id`);--> statement-breakpoint
CREATE INDEX `service_entries_press_kind_idx` ON `service_entries` (`press_id`,`kind`,`performed_on`);--> statement-breakpoint
CREATE INDEX `service_entry_revisions_entry_idx` ON `service_entry_revisions` (`entry_id`,`changed_at`);--> statement-breakpoint
CREATE INDEX `service_tasks_press_idx` ON `service_tasks` (`press_id`,`kind`);--> statement-breakpoint
CREATE INDEX `invitations_shop_idx` ON `invitations` (`shop_id`,`accepted_at`,`revoked_at`);--> statement-breakpoint
CREATE INDEX `password_resets_user_idx` ON `password_resets` (`user_id`);--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_service_entry_id_service_entries_id_fk` FOREIGN KEY (`service_entry_id`) REFERENCES `service_entries`(`id`) ON DELETE set null ON UPDATE no action;