ALTER TABLE `hour_meter_readings` ADD `kind` enum('reading','correction') DEFAULT 'reading' NOT NULL;--> statement-breakpoint
ALTER TABLE `hour_meter_readings` ADD `voided_by` bigint unsigned;