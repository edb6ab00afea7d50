CREATE TABLE `report_shares` (
	`id` text PRIMARY KEY NOT NULL,
	`token_hash` text NOT NULL,
	`job_id` text NOT NULL,
	`organisation_id` text NOT NULL,
	`created_by` text,
	`created_at` integer NOT NULL,
	`expires_at` integer NOT NULL,
	`revoked_at` integer,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `report_shares_token_hash_unique` ON `report_shares` (`token_hash`);--> statement-breakpoint
CREATE INDEX `report_shares_job_idx` ON `report_shares` (`job_id`);--> statement-breakpoint
CREATE TABLE `brands` (
	`organisation_id` text PRIMARY KEY NOT NULL,
	`company_name` text DEFAULT '' NOT NULL,
	`logo_file` text,
	`logo_content_type` text,
	`logo_width` integer,
	`logo_height` integer,
	`primary_colour` text DEFAULT '#12343b' NOT NULL,
	`accent_colour` text DEFAULT '#1b7f86' NOT NULL,
	`licence_number` text DEFAULT '' NOT NULL,
	`contact_block` text DEFAULT '' NOT NULL,
	`report_footer` text DEFAULT '' NOT NULL,
	`updated_by` text,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
