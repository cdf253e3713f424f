ALTER TABLE `user` DROP INDEX `user_org_idx`, ADD INDEX `user_org_idx` (`organization_id`,`team_id`,`name`);
