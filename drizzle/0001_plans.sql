CREATE TABLE `check_ins` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`date` text NOT NULL,
	`kind` text NOT NULL,
	`payload` text NOT NULL,
	`client_key` text NOT NULL,
	`recorded_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `check_ins_musician_date_idx` ON `check_ins` (`musician_id`,`date`);--> statement-breakpoint
CREATE UNIQUE INDEX `check_ins_client_key_idx` ON `check_ins` (`musician_id`,`client_key`);--> statement-breakpoint
CREATE TABLE `pieces` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`title` text NOT NULL,
	`composer` text DEFAULT '' NOT NULL,
	`tier` text NOT NULL,
	`passages` text DEFAULT '[]' NOT NULL,
	`on_programme` integer DEFAULT false NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "pieces_tier_check" CHECK("pieces"."tier" in ('easy', 'moderate', 'demanding'))
);
--> statement-breakpoint
CREATE INDEX `pieces_musician_idx` ON `pieces` (`musician_id`);--> statement-breakpoint
CREATE TABLE `plan_overrides` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`action` text NOT NULL,
	`date` text NOT NULL,
	`reason` text NOT NULL,
	`by_user_id` text NOT NULL,
	`at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`by_user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `plan_overrides_musician_idx` ON `plan_overrides` (`musician_id`);--> statement-breakpoint
CREATE TABLE `plans` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`version` integer NOT NULL,
	`status` text NOT NULL,
	`settings` text NOT NULL,
	`created_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	`activated_at` integer,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "plans_status_check" CHECK("plans"."status" in ('draft', 'active', 'superseded'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `plans_version_idx` ON `plans` (`musician_id`,`version`);--> statement-breakpoint
CREATE UNIQUE INDEX `plans_one_active_idx` ON `plans` (`musician_id`) WHERE "plans"."status" = 'active';