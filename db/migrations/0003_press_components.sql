CREATE TABLE `components` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`kind` enum('frame-member','crosshead','bolster','cylinder','pump','motor','directional-valve','relief-valve','hose','filter','reservoir','gauge','die') NOT NULL,
	`label` varchar(100) NOT NULL,
	`spec` json NOT NULL,
	`maker` varchar(100),
	`part_number` varchar(100),
	`supplier` varchar(100),
	`cost_cents` int,
	`purchased` boolean NOT NULL DEFAULT true,
	`installed_on` date,
	`removed_on` date,
	`removal_reason` varchar(255),
	`replaced_by_id` varchar(24),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `components_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `hour_meter_readings` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`hours` double NOT NULL,
	`read_at` datetime(3) NOT NULL,
	`recorded_by` varchar(24),
	`note` varchar(255),
	CONSTRAINT `hour_meter_readings_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `shops` ADD `currency` varchar(3) DEFAULT 'USD' NOT NULL;--> statement-breakpoint
ALTER TABLE `components` ADD CONSTRAINT `components_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `hour_meter_readings` ADD CONSTRAINT `hour_meter_readings_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `hour_meter_readings` ADD CONSTRAINT `hour_meter_readings_recorded_by_users_id_fk` FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `components_press_idx` ON `components` (`press_id`,`removed_on`);--> statement-breakpoint
CREATE INDEX `hour_readings_press_idx` ON `hour_meter_readings` (`press_id`,`read_at`);