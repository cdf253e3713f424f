CREATE TABLE `board_count_delta` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`organization_id` varchar(36) NOT NULL,
	`team_id` varchar(36),
	`module_slug` varchar(80) NOT NULL,
	`expires_at` datetime(3),
	`due_at` datetime(3),
	`failed` boolean NOT NULL,
	`n` tinyint NOT NULL,
	CONSTRAINT `board_count_delta_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `board_count_state` (
	`organization_id` varchar(36) NOT NULL,
	`counted_at` datetime(3) NOT NULL,
	CONSTRAINT `board_count_state_organization_id` PRIMARY KEY(`organization_id`)
);
--> statement-breakpoint
CREATE TABLE `board_team_count` (
	`organization_id` varchar(36) NOT NULL,
	`team_key` varchar(36) NOT NULL,
	`module_slug` varchar(80) NOT NULL,
	`passed` int NOT NULL DEFAULT 0,
	`expiring` int NOT NULL DEFAULT 0,
	`overdue` int NOT NULL DEFAULT 0,
	`expired` int NOT NULL DEFAULT 0,
	`failed` int NOT NULL DEFAULT 0,
	CONSTRAINT `board_team_count_pk` PRIMARY KEY(`organization_id`,`team_key`,`module_slug`)
);
--> statement-breakpoint
ALTER TABLE `board_count_state` ADD CONSTRAINT `board_count_state_org_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `board_team_count` ADD CONSTRAINT `board_team_count_org_fk` FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `board_count_delta_org_idx` ON `board_count_delta` (`organization_id`,`id`);
--> statement-breakpoint
CREATE TRIGGER `board_cell_count_ai` AFTER INSERT ON `board_cell` FOR EACH ROW
BEGIN
  -- a cell without expiry, due date or failed attempt is never counted (in progress or not started)
  IF @riser_board_bulk IS NULL AND (NEW.organization_id IS NOT NULL AND (NEW.expires_at IS NOT NULL OR NEW.due_at IS NOT NULL OR (NEW.last_graded_at IS NOT NULL AND (NEW.last_pass_at IS NULL OR NEW.last_pass_at < NEW.last_graded_at)))) THEN
    INSERT INTO board_count_delta (organization_id, team_id, module_slug, expires_at, due_at, failed, n) VALUES (NEW.organization_id, NEW.team_id, NEW.module_slug, NEW.expires_at, NEW.due_at, (NEW.last_graded_at IS NOT NULL AND (NEW.last_pass_at IS NULL OR NEW.last_pass_at < NEW.last_graded_at)), 1);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_cell_count_au` AFTER UPDATE ON `board_cell` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL AND NOT (OLD.organization_id <=> NEW.organization_id AND OLD.team_id <=> NEW.team_id AND OLD.module_slug <=> NEW.module_slug
      AND OLD.expires_at <=> NEW.expires_at AND OLD.due_at <=> NEW.due_at AND (OLD.last_graded_at IS NOT NULL AND (OLD.last_pass_at IS NULL OR OLD.last_pass_at < OLD.last_graded_at)) <=> (NEW.last_graded_at IS NOT NULL AND (NEW.last_pass_at IS NULL OR NEW.last_pass_at < NEW.last_graded_at))) THEN
    IF (OLD.organization_id IS NOT NULL AND (OLD.expires_at IS NOT NULL OR OLD.due_at IS NOT NULL OR (OLD.last_graded_at IS NOT NULL AND (OLD.last_pass_at IS NULL OR OLD.last_pass_at < OLD.last_graded_at)))) THEN
      INSERT INTO board_count_delta (organization_id, team_id, module_slug, expires_at, due_at, failed, n) VALUES (OLD.organization_id, OLD.team_id, OLD.module_slug, OLD.expires_at, OLD.due_at, (OLD.last_graded_at IS NOT NULL AND (OLD.last_pass_at IS NULL OR OLD.last_pass_at < OLD.last_graded_at)), -1);
    END IF;
    IF (NEW.organization_id IS NOT NULL AND (NEW.expires_at IS NOT NULL OR NEW.due_at IS NOT NULL OR (NEW.last_graded_at IS NOT NULL AND (NEW.last_pass_at IS NULL OR NEW.last_pass_at < NEW.last_graded_at)))) THEN
      INSERT INTO board_count_delta (organization_id, team_id, module_slug, expires_at, due_at, failed, n) VALUES (NEW.organization_id, NEW.team_id, NEW.module_slug, NEW.expires_at, NEW.due_at, (NEW.last_graded_at IS NOT NULL AND (NEW.last_pass_at IS NULL OR NEW.last_pass_at < NEW.last_graded_at)), 1);
    END IF;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_cell_count_ad` AFTER DELETE ON `board_cell` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL AND (OLD.organization_id IS NOT NULL AND (OLD.expires_at IS NOT NULL OR OLD.due_at IS NOT NULL OR (OLD.last_graded_at IS NOT NULL AND (OLD.last_pass_at IS NULL OR OLD.last_pass_at < OLD.last_graded_at)))) THEN
    INSERT INTO board_count_delta (organization_id, team_id, module_slug, expires_at, due_at, failed, n) VALUES (OLD.organization_id, OLD.team_id, OLD.module_slug, OLD.expires_at, OLD.due_at, (OLD.last_graded_at IS NOT NULL AND (OLD.last_pass_at IS NULL OR OLD.last_pass_at < OLD.last_graded_at)), -1);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_user_bd` BEFORE DELETE ON `user` FOR EACH ROW
BEGIN
  -- a foreign-key cascade fires no trigger: take the person's cells out first, so that the
  -- totals lose them through board_cell_count_ad
  IF @riser_board_bulk IS NULL THEN
    DELETE FROM board_cell WHERE user_id = OLD.id;
  END IF;
END;
--> statement-breakpoint
CREATE PROCEDURE `board_counts_reset`(IN p_org VARCHAR(36))
BEGIN
  -- the stored totals recounted from the cells at one time; callers hold (or have just rewritten)
  -- the cells, so no writer can add a change row between the recount and the deletion of the rows
  DECLARE t DATETIME(3) DEFAULT UTC_TIMESTAMP(3);
  DECLARE h DATETIME(3) DEFAULT t + INTERVAL 30 DAY;
  IF p_org IS NOT NULL THEN
    INSERT INTO board_count_state (organization_id, counted_at) VALUES (p_org, t) ON DUPLICATE KEY UPDATE counted_at = t;
    DELETE FROM board_count_delta WHERE organization_id = p_org;
    DELETE FROM board_team_count WHERE organization_id = p_org;
    INSERT INTO board_team_count (organization_id, team_key, module_slug, passed, expiring, overdue, expired, failed)
    SELECT x.organization_id, COALESCE(x.team_id, ''), x.module_slug, SUM(x.s = 1), SUM(x.s = 2), SUM(x.s = 3), SUM(x.s = 4), SUM(x.s = 5)
    FROM (SELECT c.organization_id, c.team_id, c.module_slug, CASE WHEN c.expires_at > h THEN 1 WHEN c.expires_at > t THEN 2 WHEN c.due_at < t THEN 3 WHEN c.expires_at IS NOT NULL THEN 4
      WHEN c.last_graded_at IS NOT NULL AND (c.last_pass_at IS NULL OR c.last_pass_at < c.last_graded_at) THEN 5 ELSE 0 END AS s
      FROM board_cell c WHERE c.organization_id = p_org) x
    GROUP BY x.organization_id, x.team_id, x.module_slug
    HAVING SUM(x.s > 0) > 0;
  ELSE
    INSERT INTO board_count_state (organization_id, counted_at) SELECT o.id, t FROM organization o ON DUPLICATE KEY UPDATE counted_at = t;
    DELETE FROM board_count_delta;
    DELETE FROM board_team_count;
    INSERT INTO board_team_count (organization_id, team_key, module_slug, passed, expiring, overdue, expired, failed)
    SELECT x.organization_id, COALESCE(x.team_id, ''), x.module_slug, SUM(x.s = 1), SUM(x.s = 2), SUM(x.s = 3), SUM(x.s = 4), SUM(x.s = 5)
    FROM (SELECT c.organization_id, c.team_id, c.module_slug, CASE WHEN c.expires_at > h THEN 1 WHEN c.expires_at > t THEN 2 WHEN c.due_at < t THEN 3 WHEN c.expires_at IS NOT NULL THEN 4
      WHEN c.last_graded_at IS NOT NULL AND (c.last_pass_at IS NULL OR c.last_pass_at < c.last_graded_at) THEN 5 ELSE 0 END AS s
      FROM board_cell c JOIN organization o ON o.id = c.organization_id WHERE TRUE) x
    GROUP BY x.organization_id, x.team_id, x.module_slug
    HAVING SUM(x.s > 0) > 0;
  END IF;
END;
--> statement-breakpoint
CREATE PROCEDURE `board_cells_rebuild`(IN p_org VARCHAR(36), IN p_user VARCHAR(36))
BEGIN
  -- one person, one organization, or everyone; each branch names its own condition so that the
  -- optimizer sees a plain equality (an "x IS NULL OR" on a parameter would scan every table)
  IF p_user IS NOT NULL THEN
    DELETE FROM board_cell WHERE user_id = p_user;
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, lessons_done, attempts, best_score, last_graded_at, last_pass_at, completed_at, certificates, valid_until, due_at)
    SELECT f.user_id, f.module_slug, MAX(f.org), MAX(f.team), SUM(f.lessons), SUM(f.attempts), MAX(f.score), MAX(f.graded), MAX(f.pass), MAX(f.completed), SUM(f.certs), MAX(f.valid), MIN(f.due)
    FROM (
      SELECT u.id AS user_id, cm.slug AS module_slug, u.organization_id AS org, u.team_id AS team, 1 AS lessons, 0 AS attempts, NULL AS score, NULL AS graded, NULL AS pass, NULL AS completed, 0 AS certs, NULL AS valid, NULL AS due
        FROM user u JOIN lesson_progress lp ON lp.user_id = u.id JOIN catalog_lesson cl ON cl.id = lp.lesson_id AND cl.retired_at IS NULL JOIN catalog_module cm ON cm.id = cl.module_id
        WHERE u.id = p_user
      UNION ALL
      SELECT u.id, a.module_slug, u.organization_id, u.team_id, 0, 1, a.score, IF(a.status = 'graded', a.submitted_at, NULL), IF(a.status = 'graded' AND a.passed = 1, a.submitted_at, NULL), NULL, 0, NULL, NULL
        FROM user u JOIN quiz_attempt a ON a.user_id = u.id AND a.organization_id <=> u.organization_id
        WHERE u.id = p_user
      UNION ALL
      SELECT u.id, c.module_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, c.completed_at, 0, NULL, NULL
        FROM user u JOIN module_completion c ON c.user_id = u.id
        WHERE u.id = p_user
      UNION ALL
      SELECT u.id, c.subject_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, NULL, 1, IF(c.revoked_at IS NULL, c.expires_at, NULL), NULL
        FROM user u JOIN certificate c ON c.user_id = u.id AND c.kind = 'module' AND c.organization_id <=> u.organization_id
        WHERE u.id = p_user
      UNION ALL
      SELECT u.id, m.module_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, NULL, 0, NULL, a.due_at
        FROM user u JOIN assignment a ON a.organization_id = u.organization_id AND (a.user_id = u.id OR a.team_id = u.team_id)
        JOIN (SELECT CAST('module' AS CHAR(10) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci AS kind, cm.slug AS target_slug, cm.slug AS module_slug FROM catalog_module cm UNION ALL SELECT 'path', p.slug, CAST(j.slug AS CHAR(80) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci FROM catalog_path p, JSON_TABLE(p.module_slugs, '$[*]' COLUMNS (slug VARCHAR(80) CHARACTER SET utf8mb4 PATH '$')) j WHERE p.retired_at IS NULL) m ON m.kind = a.kind AND m.target_slug = a.target_slug
        WHERE u.id = p_user
    ) f
    GROUP BY f.user_id, f.module_slug;
  ELSEIF p_org IS NOT NULL THEN
    DELETE FROM board_cell WHERE organization_id = p_org;
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, lessons_done, attempts, best_score, last_graded_at, last_pass_at, completed_at, certificates, valid_until, due_at)
    SELECT f.user_id, f.module_slug, MAX(f.org), MAX(f.team), SUM(f.lessons), SUM(f.attempts), MAX(f.score), MAX(f.graded), MAX(f.pass), MAX(f.completed), SUM(f.certs), MAX(f.valid), MIN(f.due)
    FROM (
      SELECT u.id AS user_id, cm.slug AS module_slug, u.organization_id AS org, u.team_id AS team, 1 AS lessons, 0 AS attempts, NULL AS score, NULL AS graded, NULL AS pass, NULL AS completed, 0 AS certs, NULL AS valid, NULL AS due
        FROM user u JOIN lesson_progress lp ON lp.user_id = u.id JOIN catalog_lesson cl ON cl.id = lp.lesson_id AND cl.retired_at IS NULL JOIN catalog_module cm ON cm.id = cl.module_id
        WHERE u.organization_id = p_org
      UNION ALL
      SELECT u.id, a.module_slug, u.organization_id, u.team_id, 0, 1, a.score, IF(a.status = 'graded', a.submitted_at, NULL), IF(a.status = 'graded' AND a.passed = 1, a.submitted_at, NULL), NULL, 0, NULL, NULL
        FROM user u JOIN quiz_attempt a ON a.user_id = u.id AND a.organization_id <=> u.organization_id
        WHERE u.organization_id = p_org
      UNION ALL
      SELECT u.id, c.module_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, c.completed_at, 0, NULL, NULL
        FROM user u JOIN module_completion c ON c.user_id = u.id
        WHERE u.organization_id = p_org
      UNION ALL
      SELECT u.id, c.subject_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, NULL, 1, IF(c.revoked_at IS NULL, c.expires_at, NULL), NULL
        FROM user u JOIN certificate c ON c.user_id = u.id AND c.kind = 'module' AND c.organization_id <=> u.organization_id
        WHERE u.organization_id = p_org
      UNION ALL
      SELECT u.id, m.module_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, NULL, 0, NULL, a.due_at
        FROM user u JOIN assignment a ON a.organization_id = u.organization_id AND (a.user_id = u.id OR a.team_id = u.team_id)
        JOIN (SELECT CAST('module' AS CHAR(10) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci AS kind, cm.slug AS target_slug, cm.slug AS module_slug FROM catalog_module cm UNION ALL SELECT 'path', p.slug, CAST(j.slug AS CHAR(80) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci FROM catalog_path p, JSON_TABLE(p.module_slugs, '$[*]' COLUMNS (slug VARCHAR(80) CHARACTER SET utf8mb4 PATH '$')) j WHERE p.retired_at IS NULL) m ON m.kind = a.kind AND m.target_slug = a.target_slug
        WHERE u.organization_id = p_org
    ) f
    GROUP BY f.user_id, f.module_slug;
  ELSE
    DELETE FROM board_cell;
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, lessons_done, attempts, best_score, last_graded_at, last_pass_at, completed_at, certificates, valid_until, due_at)
    SELECT f.user_id, f.module_slug, MAX(f.org), MAX(f.team), SUM(f.lessons), SUM(f.attempts), MAX(f.score), MAX(f.graded), MAX(f.pass), MAX(f.completed), SUM(f.certs), MAX(f.valid), MIN(f.due)
    FROM (
      SELECT u.id AS user_id, cm.slug AS module_slug, u.organization_id AS org, u.team_id AS team, 1 AS lessons, 0 AS attempts, NULL AS score, NULL AS graded, NULL AS pass, NULL AS completed, 0 AS certs, NULL AS valid, NULL AS due
        FROM user u JOIN lesson_progress lp ON lp.user_id = u.id JOIN catalog_lesson cl ON cl.id = lp.lesson_id AND cl.retired_at IS NULL JOIN catalog_module cm ON cm.id = cl.module_id
        WHERE u.organization_id IS NOT NULL
      UNION ALL
      SELECT u.id, a.module_slug, u.organization_id, u.team_id, 0, 1, a.score, IF(a.status = 'graded', a.submitted_at, NULL), IF(a.status = 'graded' AND a.passed = 1, a.submitted_at, NULL), NULL, 0, NULL, NULL
        FROM user u JOIN quiz_attempt a ON a.user_id = u.id AND a.organization_id <=> u.organization_id
        WHERE u.organization_id IS NOT NULL
      UNION ALL
      SELECT u.id, c.module_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, c.completed_at, 0, NULL, NULL
        FROM user u JOIN module_completion c ON c.user_id = u.id
        WHERE u.organization_id IS NOT NULL
      UNION ALL
      SELECT u.id, c.subject_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, NULL, 1, IF(c.revoked_at IS NULL, c.expires_at, NULL), NULL
        FROM user u JOIN certificate c ON c.user_id = u.id AND c.kind = 'module' AND c.organization_id <=> u.organization_id
        WHERE u.organization_id IS NOT NULL
      UNION ALL
      SELECT u.id, m.module_slug, u.organization_id, u.team_id, 0, 0, NULL, NULL, NULL, NULL, 0, NULL, a.due_at
        FROM user u JOIN assignment a ON a.organization_id = u.organization_id AND (a.user_id = u.id OR a.team_id = u.team_id)
        JOIN (SELECT CAST('module' AS CHAR(10) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci AS kind, cm.slug AS target_slug, cm.slug AS module_slug FROM catalog_module cm UNION ALL SELECT 'path', p.slug, CAST(j.slug AS CHAR(80) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci FROM catalog_path p, JSON_TABLE(p.module_slugs, '$[*]' COLUMNS (slug VARCHAR(80) CHARACTER SET utf8mb4 PATH '$')) j WHERE p.retired_at IS NULL) m ON m.kind = a.kind AND m.target_slug = a.target_slug
        WHERE u.organization_id IS NOT NULL
    ) f
    GROUP BY f.user_id, f.module_slug;
  END IF;
END;
--> statement-breakpoint
DROP PROCEDURE `board_rebuild`;
--> statement-breakpoint
CREATE PROCEDURE `board_rebuild_counted`(IN p_org VARCHAR(36))
BEGIN
  -- an organization (or everyone, p_org NULL): the cells are rewritten without change rows, then
  -- the totals are recounted from them; the caller's transaction makes the two one step
  DECLARE bulk_before INT DEFAULT @riser_board_bulk;
  BEGIN
    DECLARE EXIT HANDLER FOR SQLEXCEPTION BEGIN SET @riser_board_bulk = bulk_before; RESIGNAL; END;
    SET @riser_board_bulk = 1;
    CALL board_cells_rebuild(p_org, NULL);
    SET @riser_board_bulk = bulk_before;
  END;
  CALL board_counts_reset(p_org);
END;
--> statement-breakpoint
CREATE PROCEDURE `board_rebuild_atomic`(IN p_org VARCHAR(36))
BEGIN
  DECLARE EXIT HANDLER FOR SQLEXCEPTION BEGIN ROLLBACK; RESIGNAL; END;
  START TRANSACTION;
  CALL board_rebuild_counted(p_org);
  COMMIT;
END;
--> statement-breakpoint
CREATE PROCEDURE `board_rebuild`(IN p_org VARCHAR(36), IN p_user VARCHAR(36))
BEGIN
  -- one person (also from the user trigger): every cell change goes through the count triggers.
  -- An organization or everyone: in one transaction, the caller's or its own.
  IF p_user IS NOT NULL THEN
    CALL board_cells_rebuild(NULL, p_user);
  ELSEIF @@in_transaction THEN
    CALL board_rebuild_counted(p_org);
  ELSE
    CALL board_rebuild_atomic(p_org);
  END IF;
END;
--> statement-breakpoint
CALL board_counts_reset(NULL);
