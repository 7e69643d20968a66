CREATE TABLE `account` (
	`id` text PRIMARY KEY NOT NULL,
	`account_id` text NOT NULL,
	`provider_id` text NOT NULL,
	`user_id` text NOT NULL,
	`access_token` text,
	`refresh_token` text,
	`id_token` text,
	`access_token_expires_at` integer,
	`refresh_token_expires_at` integer,
	`scope` text,
	`password` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `account_user_idx` ON `account` (`user_id`);--> statement-breakpoint
CREATE TABLE `session` (
	`id` text PRIMARY KEY NOT NULL,
	`token` text NOT NULL,
	`user_id` text NOT NULL,
	`expires_at` integer NOT NULL,
	`ip_address` text,
	`user_agent` text,
	`impersonated_by` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `session_token_unique` ON `session` (`token`);--> statement-breakpoint
CREATE INDEX `session_user_idx` ON `session` (`user_id`);--> statement-breakpoint
CREATE TABLE `user` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`email` text NOT NULL,
	`email_verified` integer DEFAULT false NOT NULL,
	`image` text,
	`role` text,
	`banned` integer DEFAULT false,
	`ban_reason` text,
	`ban_expires` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	CONSTRAINT "user_role_check" CHECK("user"."role" in ('clinician', 'musician', 'teacher', 'admin'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `user_email_unique` ON `user` (`email`);--> statement-breakpoint
CREATE TABLE `verification` (
	`id` text PRIMARY KEY NOT NULL,
	`identifier` text NOT NULL,
	`value` text NOT NULL,
	`expires_at` integer NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL
);
--> statement-breakpoint
CREATE INDEX `verification_identifier_idx` ON `verification` (`identifier`);--> statement-breakpoint
CREATE TABLE `clearance_shares` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`teacher_id` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`teacher_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `clearance_shares_pair_idx` ON `clearance_shares` (`musician_id`,`teacher_id`);--> statement-breakpoint
CREATE TABLE `invitations` (
	`id` text PRIMARY KEY NOT NULL,
	`role` text NOT NULL,
	`email` text NOT NULL,
	`name` text NOT NULL,
	`invited_by_id` text NOT NULL,
	`musician_id` text,
	`token_hash` text NOT NULL,
	`expires_at` integer NOT NULL,
	`accepted_at` integer,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`invited_by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "invitations_role_check" CHECK("invitations"."role" in ('musician', 'teacher')),
	CONSTRAINT "invitations_musician_check" CHECK("invitations"."role" <> 'musician' or "invitations"."musician_id" is not null)
);
--> statement-breakpoint
CREATE UNIQUE INDEX `invitations_token_hash_unique` ON `invitations` (`token_hash`);--> statement-breakpoint
CREATE TABLE `musicians` (
	`id` text PRIMARY KEY NOT NULL,
	`clinician_id` text NOT NULL,
	`user_id` text,
	`name` text NOT NULL,
	`email` text NOT NULL,
	`instrument` text NOT NULL,
	`problem_region` text,
	`problem_side` text,
	`problem_onset` text,
	`problem_summary` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`clinician_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `musicians_user_id_unique` ON `musicians` (`user_id`);--> statement-breakpoint
CREATE INDEX `musicians_clinician_idx` ON `musicians` (`clinician_id`);--> statement-breakpoint
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
CREATE UNIQUE INDEX `plans_one_active_idx` ON `plans` (`musician_id`) WHERE "plans"."status" = 'active';--> statement-breakpoint
CREATE TABLE `clinical_notes` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`author_id` text NOT NULL,
	`body` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`author_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `clinical_notes_musician_idx` ON `clinical_notes` (`musician_id`);--> statement-breakpoint
CREATE TABLE `documents` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`uploaded_by_id` text NOT NULL,
	`title` text NOT NULL,
	`file_name` text NOT NULL,
	`mime_type` text NOT NULL,
	`size_bytes` integer NOT NULL,
	`storage_key` text NOT NULL,
	`visibility` text DEFAULT 'private' NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`uploaded_by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "documents_visibility_check" CHECK("documents"."visibility" in ('private', 'shared'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `documents_storage_key_unique` ON `documents` (`storage_key`);--> statement-breakpoint
CREATE INDEX `documents_musician_idx` ON `documents` (`musician_id`);--> statement-breakpoint
CREATE TABLE `setup_items` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`kind` text NOT NULL,
	`label` text NOT NULL,
	`instructions` text DEFAULT '' NOT NULL,
	`active` integer DEFAULT true NOT NULL,
	`created_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `setup_items_musician_idx` ON `setup_items` (`musician_id`);--> statement-breakpoint
CREATE TABLE `audit_events` (
	`id` text PRIMARY KEY NOT NULL,
	`actor_id` text,
	`action` text NOT NULL,
	`musician_id` text,
	`detail` text DEFAULT '{}' NOT NULL,
	`at` integer NOT NULL,
	FOREIGN KEY (`actor_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `audit_events_musician_idx` ON `audit_events` (`musician_id`);--> statement-breakpoint
CREATE TABLE `calendar_event_versions` (
	`uid` text PRIMARY KEY NOT NULL,
	`musician_id` text NOT NULL,
	`content_hash` text NOT NULL,
	`starts_at` text NOT NULL,
	`ends_at` text NOT NULL,
	`summary` text NOT NULL,
	`sequence` integer DEFAULT 0 NOT NULL,
	`cancelled` integer DEFAULT false NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `calendar_event_versions_musician_idx` ON `calendar_event_versions` (`musician_id`);--> statement-breakpoint
CREATE TABLE `calendar_feeds` (
	`musician_id` text PRIMARY KEY NOT NULL,
	`token_hash` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `calendar_feeds_token_hash_unique` ON `calendar_feeds` (`token_hash`);--> statement-breakpoint
CREATE TABLE `notifications` (
	`id` text PRIMARY KEY NOT NULL,
	`musician_id` text,
	`kind` text NOT NULL,
	`dedupe_key` text NOT NULL,
	`recipient` text NOT NULL,
	`sent_at` integer NOT NULL,
	FOREIGN KEY (`musician_id`) REFERENCES `musicians`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `notifications_dedupe_key_unique` ON `notifications` (`dedupe_key`);--> statement-breakpoint
CREATE INDEX `notifications_musician_idx` ON `notifications` (`musician_id`);