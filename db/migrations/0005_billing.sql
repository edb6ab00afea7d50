CREATE TABLE `billing_customers` (
	`organisation_id` text PRIMARY KEY NOT NULL,
	`customer_id` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `billing_customers_customer_id_unique` ON `billing_customers` (`customer_id`);--> statement-breakpoint
CREATE TABLE `billing_events` (
	`id` text PRIMARY KEY NOT NULL,
	`type` text NOT NULL,
	`object_id` text,
	`created_at` integer NOT NULL,
	`received_at` integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE `subscriptions` (
	`id` text PRIMARY KEY NOT NULL,
	`organisation_id` text NOT NULL,
	`customer_id` text NOT NULL,
	`status` text NOT NULL,
	`price_id` text NOT NULL,
	`item_id` text NOT NULL,
	`interval` text NOT NULL,
	`seats` integer NOT NULL,
	`cancel_at_period_end` integer NOT NULL,
	`current_period_start` integer,
	`current_period_end` integer,
	`trial_end` integer,
	`canceled_at` integer,
	`ended_at` integer,
	`started_at` integer NOT NULL,
	`past_due_since` integer,
	`synced_at` integer NOT NULL,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `subscriptions_org_idx` ON `subscriptions` (`organisation_id`,`started_at`);