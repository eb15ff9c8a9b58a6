-- A plan task needs at least one positive interval; a service entry's cost and hours are never negative.
ALTER TABLE `service_tasks` ADD CONSTRAINT `service_tasks_interval_check` CHECK ((`interval_days` IS NOT NULL AND `interval_days` > 0) OR (`interval_hours` IS NOT NULL AND `interval_hours` > 0));
--> statement-breakpoint
ALTER TABLE `service_entries` ADD CONSTRAINT `service_entries_figures_check` CHECK ((`cost_cents` IS NULL OR `cost_cents` >= 0) AND (`hours` IS NULL OR `hours` >= 0));
