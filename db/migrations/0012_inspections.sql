CREATE TABLE `inspection_answer_ops` (
	`op_key` varchar(64) NOT NULL,
	`inspection_id` varchar(24) NOT NULL,
	`item_key` varchar(40) NOT NULL,
	`applied_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `inspection_answer_ops_op_key` PRIMARY KEY(`op_key`)
);
--> statement-breakpoint
CREATE TABLE `inspection_answers` (
	`id` varchar(24) NOT NULL,
	`inspection_id` varchar(24) NOT NULL,
	`item_key` varchar(40) NOT NULL,
	`position` int NOT NULL,
	`outcome` enum('pass','fail','na'),
	`note` varchar(1000),
	`answered_by` varchar(24),
	`answered_at` datetime(3),
	CONSTRAINT `inspection_answers_id` PRIMARY KEY(`id`),
	CONSTRAINT `inspection_answers_item` UNIQUE(`inspection_id`,`item_key`)
);
--> statement-breakpoint
CREATE TABLE `inspection_templates` (
	`id` varchar(24) NOT NULL,
	`shop_id` varchar(24) NOT NULL,
	`name` varchar(100) NOT NULL,
	`cadence` enum('pre-use','weekly','monthly','yearly','after-modification') NOT NULL,
	`signer_role` enum('member','inspector') NOT NULL,
	`items` json NOT NULL,
	`archived` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `inspection_templates_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `inspections` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`template_id` varchar(24),
	`template_name` varchar(100) NOT NULL,
	`cadence` enum('pre-use','weekly','monthly','yearly','after-modification') NOT NULL,
	`signer_role` enum('member','inspector') NOT NULL,
	`items` json NOT NULL,
	`started_by` varchar(24),
	`started_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`result` enum('pass','fail'),
	`signed_by` varchar(24),
	`signer_name` varchar(80),
	`signed_at` datetime(3),
	`chain_seq` int,
	`prev_hash` char(64),
	`chain_hash` char(64),
	CONSTRAINT `inspections_id` PRIMARY KEY(`id`),
	CONSTRAINT `inspections_press_chain_seq` UNIQUE(`press_id`,`chain_seq`)
);
--> statement-breakpoint
ALTER TABLE `inspection_answer_ops` ADD CONSTRAINT `inspection_answer_ops_inspection_id_inspections_id_fk` FOREIGN KEY (`inspection_id`) REFERENCES `inspections`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspection_answers` ADD CONSTRAINT `inspection_answers_inspection_id_inspections_id_fk` FOREIGN KEY (`inspection_id`) REFERENCES `inspections`(`id`) ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspection_answers` ADD CONSTRAINT `inspection_answers_answered_by_users_id_fk` FOREIGN KEY (`answered_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspection_templates` ADD CONSTRAINT `inspection_templates_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_template_id_inspection_templates_id_fk` FOREIGN KEY (`template_id`) REFERENCES `inspection_templates`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_started_by_users_id_fk` FOREIGN KEY (`started_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_signed_by_users_id_fk` FOREIGN KEY (`signed_by`) REFERENCES `users`(`id`) ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `inspection_answer_ops_inspection_idx` ON `inspection_answer_ops` (`inspection_id`);--> statement-breakpoint
CREATE INDEX `inspection_templates_shop_idx` ON `inspection_templates` (`shop_id`,`archived`);--> statement-breakpoint
CREATE INDEX `inspections_press_signed_idx` ON `inspections` (`press_id`,`signed_at`);--> statement-breakpoint
CREATE INDEX `inspections_press_template_idx` ON `inspections` (`press_id`,`template_id`,`signed_at`);--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_inspection_item_id_inspection_answers_id_fk` FOREIGN KEY (`inspection_item_id`) REFERENCES `inspection_answers`(`id`) ON DELETE set null ON UPDATE no action;