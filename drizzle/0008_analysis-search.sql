-- Search of a project's analyses by name and summary (src/lib/server/db/search.ts), on SQLite.
-- analysis_text holds each analysis's searchable words under a stable integer key; analysis_search
-- is an FTS5 index over it with the trigram tokenizer, so a search finds any run of three or more
-- characters inside a name or summary (as LIKE '%…%' does), without reading every analysis. Both are
-- kept by triggers on analysis; neither is part of the Drizzle schema.
CREATE TABLE `analysis_text` (
	`row` integer PRIMARY KEY,
	`analysis_id` text NOT NULL UNIQUE REFERENCES `analysis`(`id`) ON DELETE CASCADE,
	`name` text NOT NULL,
	`summary` text NOT NULL
);
--> statement-breakpoint
CREATE VIRTUAL TABLE `analysis_search` USING fts5(
	`name`, `summary`, content='analysis_text', content_rowid='row', tokenize='trigram'
);
--> statement-breakpoint
CREATE TRIGGER `analysis_text_insert` AFTER INSERT ON `analysis_text` BEGIN
	INSERT INTO `analysis_search`(rowid, `name`, `summary`) VALUES (new.`row`, new.`name`, new.`summary`);
END;
--> statement-breakpoint
CREATE TRIGGER `analysis_text_delete` AFTER DELETE ON `analysis_text` BEGIN
	INSERT INTO `analysis_search`(`analysis_search`, rowid, `name`, `summary`)
		VALUES ('delete', old.`row`, old.`name`, old.`summary`);
END;
--> statement-breakpoint
CREATE TRIGGER `analysis_text_update` AFTER UPDATE ON `analysis_text` BEGIN
	INSERT INTO `analysis_search`(`analysis_search`, rowid, `name`, `summary`)
		VALUES ('delete', old.`row`, old.`name`, old.`summary`);
	INSERT INTO `analysis_search`(rowid, `name`, `summary`) VALUES (new.`row`, new.`name`, new.`summary`);
END;
--> statement-breakpoint
CREATE TRIGGER `analysis_search_insert` AFTER INSERT ON `analysis` BEGIN
	INSERT INTO `analysis_text`(`analysis_id`, `name`, `summary`) VALUES (new.`id`, new.`name`, new.`summary`);
END;
--> statement-breakpoint
CREATE TRIGGER `analysis_search_update` AFTER UPDATE OF `name`, `summary` ON `analysis` BEGIN
	UPDATE `analysis_text` SET `name` = new.`name`, `summary` = new.`summary` WHERE `analysis_id` = new.`id`;
END;
--> statement-breakpoint
INSERT INTO `analysis_text`(`analysis_id`, `name`, `summary`) SELECT `id`, `name`, `summary` FROM `analysis`;
