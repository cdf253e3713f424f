CREATE TABLE `board_cell` (
	`user_id` varchar(36) NOT NULL,
	`module_slug` varchar(80) NOT NULL,
	`organization_id` varchar(36),
	`team_id` varchar(36),
	`lessons_done` int NOT NULL DEFAULT 0,
	`attempts` int NOT NULL DEFAULT 0,
	`best_score` int,
	`last_graded_at` datetime(3),
	`last_pass_at` datetime(3),
	`completed_at` datetime(3),
	`certificates` int NOT NULL DEFAULT 0,
	`valid_until` datetime(3),
	`due_at` datetime(3),
	`validity_months` int NOT NULL DEFAULT 0,
	`expires_at` datetime(3) GENERATED ALWAYS AS (IF(certificates > 0, valid_until, completed_at + INTERVAL validity_months MONTH)) STORED,
	CONSTRAINT `board_cell_pk` PRIMARY KEY(`user_id`,`module_slug`)
);
--> statement-breakpoint
ALTER TABLE `board_cell` ADD CONSTRAINT `board_cell_user_fk` FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `board_cell_org_idx` ON `board_cell` (`organization_id`,`team_id`,`expires_at`,`due_at`,`last_graded_at`,`last_pass_at`,`lessons_done`,`attempts`);--> statement-breakpoint
CREATE INDEX `board_cell_org_expiry_idx` ON `board_cell` (`organization_id`,`expires_at`,`due_at`);--> statement-breakpoint
CREATE INDEX `board_cell_org_due_idx` ON `board_cell` (`organization_id`,`due_at`,`expires_at`);--> statement-breakpoint
CREATE TRIGGER `board_cell_bi` BEFORE INSERT ON `board_cell` FOR EACH ROW
SET NEW.validity_months = COALESCE((SELECT m.validity_months FROM catalog_module m WHERE m.slug = NEW.module_slug), 0);
--> statement-breakpoint
CREATE PROCEDURE `board_rebuild`(IN p_org VARCHAR(36), IN p_user VARCHAR(36))
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
CREATE PROCEDURE `board_due_refresh`(IN p_user VARCHAR(36), IN p_team VARCHAR(36))
BEGIN
  IF p_user IS NOT NULL THEN
    UPDATE board_cell c JOIN user u ON u.id = c.user_id SET c.due_at = NULL WHERE u.id = p_user;
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, due_at)
    SELECT u.id, m.module_slug, MAX(u.organization_id), MAX(u.team_id), MIN(a.due_at)
      FROM user u JOIN assignment a ON a.organization_id = u.organization_id AND (a.user_id = u.id OR a.team_id = u.team_id)
      JOIN (SELECT CAST('module' AS CHAR(10) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci AS kind, cm.slug AS target_slug, cm.slug AS module_slug FROM catalog_module cm UNION ALL SELECT 'path', p.slug, CAST(j.slug AS CHAR(80) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci FROM catalog_path p, JSON_TABLE(p.module_slugs, '$[*]' COLUMNS (slug VARCHAR(80) CHARACTER SET utf8mb4 PATH '$')) j WHERE p.retired_at IS NULL) m ON m.kind = a.kind AND m.target_slug = a.target_slug
      WHERE u.id = p_user
      GROUP BY u.id, m.module_slug
    ON DUPLICATE KEY UPDATE due_at = VALUES(due_at);
  END IF;
  IF p_team IS NOT NULL THEN
    UPDATE board_cell c JOIN user u ON u.id = c.user_id SET c.due_at = NULL WHERE u.team_id = p_team;
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, due_at)
    SELECT u.id, m.module_slug, MAX(u.organization_id), MAX(u.team_id), MIN(a.due_at)
      FROM user u JOIN assignment a ON a.organization_id = u.organization_id AND (a.user_id = u.id OR a.team_id = u.team_id)
      JOIN (SELECT CAST('module' AS CHAR(10) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci AS kind, cm.slug AS target_slug, cm.slug AS module_slug FROM catalog_module cm UNION ALL SELECT 'path', p.slug, CAST(j.slug AS CHAR(80) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci FROM catalog_path p, JSON_TABLE(p.module_slugs, '$[*]' COLUMNS (slug VARCHAR(80) CHARACTER SET utf8mb4 PATH '$')) j WHERE p.retired_at IS NULL) m ON m.kind = a.kind AND m.target_slug = a.target_slug
      WHERE u.team_id = p_team
      GROUP BY u.id, m.module_slug
    ON DUPLICATE KEY UPDATE due_at = VALUES(due_at);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_progress_ai` AFTER INSERT ON `lesson_progress` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, lessons_done)
    SELECT NEW.user_id, cm.slug, u.organization_id, u.team_id, 1
      FROM user u JOIN catalog_lesson cl ON cl.id = NEW.lesson_id AND cl.retired_at IS NULL JOIN catalog_module cm ON cm.id = cl.module_id
      WHERE u.id = NEW.user_id
    ON DUPLICATE KEY UPDATE lessons_done = lessons_done + 1;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_progress_ad` AFTER DELETE ON `lesson_progress` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    UPDATE board_cell c JOIN catalog_lesson cl ON cl.id = OLD.lesson_id AND cl.retired_at IS NULL JOIN catalog_module cm ON cm.id = cl.module_id
      SET c.lessons_done = GREATEST(c.lessons_done - 1, 0)
      WHERE c.user_id = OLD.user_id AND c.module_slug = cm.slug;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_attempt_ai` AFTER INSERT ON `quiz_attempt` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, attempts, best_score, last_graded_at, last_pass_at)
    SELECT NEW.user_id, NEW.module_slug, u.organization_id, u.team_id, 1, NEW.score,
        IF(NEW.status = 'graded', NEW.submitted_at, NULL), IF(NEW.status = 'graded' AND NEW.passed = 1, NEW.submitted_at, NULL)
      FROM user u WHERE u.id = NEW.user_id AND u.organization_id <=> NEW.organization_id
    ON DUPLICATE KEY UPDATE attempts = attempts + 1,
      best_score = COALESCE(GREATEST(best_score, VALUES(best_score)), best_score, VALUES(best_score)),
      last_graded_at = COALESCE(GREATEST(last_graded_at, VALUES(last_graded_at)), last_graded_at, VALUES(last_graded_at)),
      last_pass_at = COALESCE(GREATEST(last_pass_at, VALUES(last_pass_at)), last_pass_at, VALUES(last_pass_at));
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_attempt_au` AFTER UPDATE ON `quiz_attempt` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL AND NOT (OLD.status <=> NEW.status AND OLD.score <=> NEW.score AND OLD.passed <=> NEW.passed AND OLD.submitted_at <=> NEW.submitted_at AND OLD.organization_id <=> NEW.organization_id) THEN
    IF OLD.organization_id <=> NEW.organization_id AND OLD.module_slug <=> NEW.module_slug AND OLD.status <> 'graded' THEN
      -- grading (each attempt is graded once): the maxima only grow, no other row is read
      UPDATE board_cell c JOIN user u ON u.id = c.user_id AND u.organization_id <=> NEW.organization_id
        SET c.best_score = COALESCE(GREATEST(c.best_score, NEW.score), c.best_score, NEW.score),
          c.last_graded_at = IF(NEW.status = 'graded', COALESCE(GREATEST(c.last_graded_at, NEW.submitted_at), c.last_graded_at, NEW.submitted_at), c.last_graded_at),
          c.last_pass_at = IF(NEW.status = 'graded' AND NEW.passed = 1, COALESCE(GREATEST(c.last_pass_at, NEW.submitted_at), c.last_pass_at, NEW.submitted_at), c.last_pass_at)
        WHERE c.user_id = NEW.user_id AND c.module_slug = NEW.module_slug;
    ELSE
      UPDATE board_cell c JOIN user u ON u.id = c.user_id
        SET c.attempts = (SELECT COUNT(*) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id),
          c.best_score = (SELECT MAX(a.score) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id),
          c.last_graded_at = (SELECT MAX(a.submitted_at) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id AND a.status = 'graded'),
          c.last_pass_at = (SELECT MAX(a.submitted_at) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id AND a.status = 'graded' AND a.passed = 1)
        WHERE (c.user_id = NEW.user_id AND c.module_slug = NEW.module_slug) OR (c.user_id = OLD.user_id AND c.module_slug = OLD.module_slug);
    END IF;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_attempt_ad` AFTER DELETE ON `quiz_attempt` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    UPDATE board_cell c JOIN user u ON u.id = c.user_id
      SET c.attempts = (SELECT COUNT(*) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id),
        c.best_score = (SELECT MAX(a.score) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id),
        c.last_graded_at = (SELECT MAX(a.submitted_at) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id AND a.status = 'graded'),
        c.last_pass_at = (SELECT MAX(a.submitted_at) FROM quiz_attempt a WHERE a.user_id = c.user_id AND a.module_slug = c.module_slug AND a.organization_id <=> u.organization_id AND a.status = 'graded' AND a.passed = 1)
      WHERE c.user_id = OLD.user_id AND c.module_slug = OLD.module_slug;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_completion_ai` AFTER INSERT ON `module_completion` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, completed_at)
    SELECT NEW.user_id, NEW.module_slug, u.organization_id, u.team_id, NEW.completed_at FROM user u WHERE u.id = NEW.user_id
    ON DUPLICATE KEY UPDATE completed_at = COALESCE(GREATEST(completed_at, VALUES(completed_at)), completed_at, VALUES(completed_at));
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_completion_ad` AFTER DELETE ON `module_completion` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    UPDATE board_cell c SET c.completed_at = (SELECT MAX(x.completed_at) FROM module_completion x WHERE x.user_id = c.user_id AND x.module_slug = c.module_slug)
      WHERE c.user_id = OLD.user_id AND c.module_slug = OLD.module_slug;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_certificate_ai` AFTER INSERT ON `certificate` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL AND NEW.kind = 'module' THEN
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, certificates, valid_until)
    SELECT NEW.user_id, NEW.subject_slug, u.organization_id, u.team_id, 1, IF(NEW.revoked_at IS NULL, NEW.expires_at, NULL)
      FROM user u WHERE u.id = NEW.user_id AND u.organization_id <=> NEW.organization_id
    ON DUPLICATE KEY UPDATE certificates = certificates + 1,
      valid_until = COALESCE(GREATEST(valid_until, VALUES(valid_until)), valid_until, VALUES(valid_until));
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_certificate_au` AFTER UPDATE ON `certificate` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL AND (OLD.kind = 'module' OR NEW.kind = 'module') AND NOT (OLD.revoked_at <=> NEW.revoked_at AND OLD.expires_at <=> NEW.expires_at AND OLD.organization_id <=> NEW.organization_id AND OLD.kind <=> NEW.kind AND OLD.subject_slug <=> NEW.subject_slug AND OLD.user_id <=> NEW.user_id) THEN
    UPDATE board_cell c JOIN user u ON u.id = c.user_id
      SET c.certificates = (SELECT COUNT(*) FROM certificate x WHERE x.user_id = c.user_id AND x.kind = 'module' AND x.subject_slug = c.module_slug AND x.organization_id <=> u.organization_id),
        c.valid_until = (SELECT MAX(x.expires_at) FROM certificate x WHERE x.user_id = c.user_id AND x.kind = 'module' AND x.subject_slug = c.module_slug AND x.organization_id <=> u.organization_id AND x.revoked_at IS NULL)
      WHERE (c.user_id = NEW.user_id AND c.module_slug = NEW.subject_slug) OR (c.user_id = OLD.user_id AND c.module_slug = OLD.subject_slug);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_certificate_ad` AFTER DELETE ON `certificate` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL AND OLD.kind = 'module' THEN
    UPDATE board_cell c JOIN user u ON u.id = c.user_id
      SET c.certificates = (SELECT COUNT(*) FROM certificate x WHERE x.user_id = c.user_id AND x.kind = 'module' AND x.subject_slug = c.module_slug AND x.organization_id <=> u.organization_id),
        c.valid_until = (SELECT MAX(x.expires_at) FROM certificate x WHERE x.user_id = c.user_id AND x.kind = 'module' AND x.subject_slug = c.module_slug AND x.organization_id <=> u.organization_id AND x.revoked_at IS NULL)
      WHERE c.user_id = OLD.user_id AND c.module_slug = OLD.subject_slug;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_assignment_ai` AFTER INSERT ON `assignment` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    INSERT INTO board_cell (user_id, module_slug, organization_id, team_id, due_at)
    SELECT u.id, m.module_slug, u.organization_id, u.team_id, NEW.due_at
      FROM user u JOIN (SELECT CAST('module' AS CHAR(10) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci AS kind, cm.slug AS target_slug, cm.slug AS module_slug FROM catalog_module cm UNION ALL SELECT 'path', p.slug, CAST(j.slug AS CHAR(80) CHARACTER SET utf8mb4) COLLATE utf8mb4_unicode_ci FROM catalog_path p, JSON_TABLE(p.module_slugs, '$[*]' COLUMNS (slug VARCHAR(80) CHARACTER SET utf8mb4 PATH '$')) j WHERE p.retired_at IS NULL) m ON m.kind = NEW.kind AND m.target_slug = NEW.target_slug
      WHERE u.organization_id = NEW.organization_id AND ((NEW.user_id IS NOT NULL AND u.id = NEW.user_id) OR (NEW.team_id IS NOT NULL AND u.team_id = NEW.team_id))
    ON DUPLICATE KEY UPDATE due_at = COALESCE(LEAST(due_at, VALUES(due_at)), VALUES(due_at));
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_assignment_au` AFTER UPDATE ON `assignment` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    CALL board_due_refresh(OLD.user_id, OLD.team_id);
    IF NOT (OLD.user_id <=> NEW.user_id AND OLD.team_id <=> NEW.team_id) THEN
      CALL board_due_refresh(NEW.user_id, NEW.team_id);
    END IF;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_assignment_ad` AFTER DELETE ON `assignment` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    CALL board_due_refresh(OLD.user_id, OLD.team_id);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_user_ai` AFTER INSERT ON `user` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL AND NEW.organization_id IS NOT NULL THEN
    CALL board_due_refresh(NEW.id, NULL);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `board_user_au` AFTER UPDATE ON `user` FOR EACH ROW
BEGIN
  IF @riser_board_bulk IS NULL THEN
    IF NOT (OLD.organization_id <=> NEW.organization_id) THEN
      CALL board_rebuild(NULL, NEW.id);
    ELSEIF NOT (OLD.team_id <=> NEW.team_id) THEN
      UPDATE board_cell SET team_id = NEW.team_id WHERE user_id = NEW.id;
      CALL board_due_refresh(NEW.id, NULL);
    END IF;
  END IF;
END;
--> statement-breakpoint
CALL board_rebuild(NULL, NULL);
