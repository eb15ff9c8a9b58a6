-- Bookings of a press. MariaDB itself refuses two overlapping bookings of one press: the
-- application-time period `slot` and the key UNIQUE (press_id, slot WITHOUT OVERLAPS) (MariaDB ≥ 10.5.3).
-- A period is half-open [starts_at, ends_at): one booking may end exactly when the next starts.
-- PERIOD FOR also makes MariaDB refuse ends_at <= starts_at.
CREATE TABLE `bookings` (
	`id` varchar(24) NOT NULL,
	`press_id` varchar(24) NOT NULL,
	`user_id` varchar(24) NOT NULL,
	`starts_at` datetime(3) NOT NULL,
	`ends_at` datetime(3) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	PERIOD FOR `slot` (`starts_at`, `ends_at`),
	CONSTRAINT `bookings_id` PRIMARY KEY (`id`),
	UNIQUE KEY `bookings_no_overlap` (`press_id`, `slot` WITHOUT OVERLAPS),
	KEY `bookings_user_idx` (`user_id`, `starts_at`),
	CONSTRAINT `bookings_press_id_presses_id_fk` FOREIGN KEY (`press_id`) REFERENCES `presses` (`id`) ON DELETE CASCADE,
	CONSTRAINT `bookings_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users` (`id`) ON DELETE CASCADE
);
