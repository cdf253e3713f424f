ALTER TABLE `lesson_progress` ADD `device_reading_seconds` int;--> statement-breakpoint
ALTER TABLE `lesson_progress` ADD `device_marked_at` datetime(3);