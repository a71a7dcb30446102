CREATE TABLE `class_answer` (
	`seat_id` text NOT NULL,
	`session_id` text NOT NULL,
	`step` integer NOT NULL,
	`choice` text NOT NULL,
	`answered_at` integer NOT NULL,
	PRIMARY KEY(`seat_id`, `step`),
	FOREIGN KEY (`seat_id`) REFERENCES `class_seat`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`session_id`) REFERENCES `class_session`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `class_answer_session` ON `class_answer` (`session_id`,`step`);--> statement-breakpoint
CREATE TABLE `class_seat` (
	`id` text PRIMARY KEY NOT NULL,
	`session_id` text NOT NULL,
	`nickname` text NOT NULL,
	`nickname_key` text NOT NULL,
	`token_hash` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`session_id`) REFERENCES `class_session`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `class_seat_token_hash_unique` ON `class_seat` (`token_hash`);--> statement-breakpoint
CREATE UNIQUE INDEX `class_seat_nickname` ON `class_seat` (`session_id`,`nickname_key`);--> statement-breakpoint
CREATE TABLE `class_session` (
	`id` text PRIMARY KEY NOT NULL,
	`code` text NOT NULL,
	`host_id` text NOT NULL,
	`experiment_id` text NOT NULL,
	`step` integer DEFAULT 0 NOT NULL,
	`revealed` integer DEFAULT false NOT NULL,
	`expires_at` integer NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`host_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `class_session_code_unique` ON `class_session` (`code`);--> statement-breakpoint
CREATE INDEX `class_session_host` ON `class_session` (`host_id`);--> statement-breakpoint
CREATE INDEX `class_session_expires` ON `class_session` (`expires_at`);