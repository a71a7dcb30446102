CREATE TABLE `document` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`analysis_id` text,
	`name` text NOT NULL,
	`caption` text DEFAULT '' NOT NULL,
	`content_type` text NOT NULL,
	`bytes` integer NOT NULL,
	`width` integer,
	`height` integer,
	`file_key` text NOT NULL,
	`thumb_key` text,
	`in_record` integer DEFAULT false NOT NULL,
	`deleted_at` integer,
	`created_by` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`analysis_id`) REFERENCES `analysis`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `document_project` ON `document` (`project_id`,`created_at`);