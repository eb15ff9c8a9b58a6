CREATE TABLE `email_outbox` (
	`id` varchar(24) NOT NULL,
	`kind` enum('invitation','password-reset','sign-up-attempt','reminder-digest','booking-confirmation','booking-cancelled','tag-out-alert','problem-report') NOT NULL,
	`shop_id` varchar(24),
	`to_address` varchar(320) NOT NULL,
	`subject` varchar(300) NOT NULL,
	`text_body` mediumtext NOT NULL,
	`html_body` mediumtext NOT NULL,
	`attachments` json,
	`status` enum('pending','sent','failed') NOT NULL DEFAULT 'pending',
	`attempts` int NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`last_error` varchar(500),
	`dedupe_key` varchar(191),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`sent_at` datetime(3),
	CONSTRAINT `email_outbox_id` PRIMARY KEY(`id`),
	CONSTRAINT `email_outbox_dedupe_key` UNIQUE(`dedupe_key`)
);
--> statement-breakpoint
CREATE TABLE `press_tag_outs` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`source` enum('inspection','problem','manual') NOT NULL,
	`source_id` varchar(24),
	`reason` varchar(500) NOT NULL,
	`tagged_by` varchar(24),
	`tagged_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`cleared_at` datetime(3),
	`cleared_by` varchar(24),
	`clear_reason` varchar(500),
	CONSTRAINT `press_tag_outs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `email_outbox` ADD CONSTRAINT `email_outbox_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `press_tag_outs` ADD CONSTRAINT `press_tag_outs_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `press_tag_outs` ADD CONSTRAINT `press_tag_outs_tagged_by_users_id_fk` FOREIGN KEY (`tagged_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `press_tag_outs` ADD CONSTRAINT `press_tag_outs_cleared_by_users_id_fk` FOREIGN KEY (`cleared_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `email_outbox_due_idx` ON `email_outbox` (`status`,`next_attempt_at`);--> statement-breakpoint
CREATE INDEX `press_tag_outs_open_idx` ON `press_tag_outs` (`press_id`,`cleared_at`);--> statement-breakpoint
CREATE INDEX `press_tag_outs_source_idx` ON `press_tag_outs` (`source_id`);