ALTER TABLE `module_completion` DROP INDEX `completion_user_idx`, ADD INDEX `completion_user_idx` (`user_id`,`module_slug`,`completed_at`);--> statement-breakpoint
ALTER TABLE `board_cell` DROP INDEX `board_cell_org_idx`, ADD INDEX `board_cell_org_idx` (`organization_id`,`team_id`,`module_slug`,`expires_at`,`due_at`,`last_graded_at`,`last_pass_at`,`lessons_done`,`attempts`);
