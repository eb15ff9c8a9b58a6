CREATE TABLE `rate_limit_windows` (
	`bucket` varchar(128) NOT NULL,
	`window_start` datetime(3) NOT NULL,
	`hits` int NOT NULL DEFAULT 0,
	CONSTRAINT `rate_limit_windows_bucket_window_start_pk` PRIMARY KEY(`bucket`,`window_start`)
);
--> statement-breakpoint
ALTER TABLE `presses` ADD `sizing_input` json;