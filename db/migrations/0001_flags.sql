CREATE TABLE `audit_entries` (
	`id` text PRIMARY KEY NOT NULL,
	`actor_user_id` text,
	`actor_email` text NOT NULL,
	`action` text NOT NULL,
	`flag_id` text,
	`detail` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`actor_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`flag_id`) REFERENCES `flags`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `audit_entries_created_idx` ON `audit_entries` (`created_at`);--> statement-breakpoint
CREATE INDEX `audit_entries_flag_idx` ON `audit_entries` (`flag_id`);--> statement-breakpoint
CREATE TABLE `flag_messages` (
	`id` text PRIMARY KEY NOT NULL,
	`flag_id` text NOT NULL,
	`kind` text NOT NULL,
	`author_user_id` text,
	`body` text NOT NULL,
	`email_status` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`flag_id`) REFERENCES `flags`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`author_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `flag_messages_flag_idx` ON `flag_messages` (`flag_id`,`created_at`);--> statement-breakpoint
CREATE TABLE `flag_snapshots` (
	`flag_id` text PRIMARY KEY NOT NULL,
	`inputs` text NOT NULL,
	`results` text NOT NULL,
	`engine_version` text NOT NULL,
	`unit_system` text NOT NULL,
	`page` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`flag_id`) REFERENCES `flags`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE TABLE `flags` (
	`id` text PRIMARY KEY NOT NULL,
	`tool` text NOT NULL,
	`reason` text NOT NULL,
	`message` text DEFAULT '' NOT NULL,
	`reporter_user_id` text,
	`reporter_email` text NOT NULL,
	`organisation_id` text,
	`status` text DEFAULT 'new' NOT NULL,
	`assignee_user_id` text,
	`view_token_hash` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`reporter_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`assignee_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `flags_view_token_hash_unique` ON `flags` (`view_token_hash`);--> statement-breakpoint
CREATE INDEX `flags_status_idx` ON `flags` (`status`,`created_at`);--> statement-breakpoint
CREATE INDEX `flags_reporter_idx` ON `flags` (`reporter_user_id`);