import type { QueryInterface } from 'sequelize';
import { QueryTypes } from 'sequelize';

import { REBUILD_STATEMENTS } from '../server/trends/rollup-sql';

// Weekly rollups of primary reviews, so trends read a few thousand summed rows instead of
// every review and score of the period. Triggers add each decision and each score in the
// same transaction that writes it, whatever the write path; `npm run trends:rebuild`
// recomputes them from the raw tables. Medians are exact: the hours and minutes are whole
// numbers, so a count per value is enough to find the middle one.
// A session that bulk-loads history sets @sightline_skip_rollups = 1 and rebuilds after.
const TABLES = [
  `CREATE TABLE trend_technician_weeks (
    week DATE NOT NULL, technician_id INT UNSIGNED NOT NULL, rubric_version INT UNSIGNED NOT NULL,
    reviews INT UNSIGNED NOT NULL, score_sum DECIMAL(14,1) NOT NULL, score_n INT UNSIGNED NOT NULL,
    first_total INT UNSIGNED NOT NULL, first_accepted INT UNSIGNED NOT NULL,
    rework INT UNSIGNED NOT NULL, recaptures INT UNSIGNED NOT NULL,
    accepted INT UNSIGNED NOT NULL, accepted_revision_sum INT UNSIGNED NOT NULL,
    PRIMARY KEY (week, technician_id, rubric_version), KEY (technician_id, week)
  ) ENGINE=InnoDB`,
  `CREATE TABLE trend_criterion_weeks (
    week DATE NOT NULL, technician_id INT UNSIGNED NOT NULL, rubric_version INT UNSIGNED NOT NULL,
    criterion_key VARCHAR(40) NOT NULL, below_full INT UNSIGNED NOT NULL,
    PRIMARY KEY (week, technician_id, rubric_version, criterion_key), KEY (technician_id, week)
  ) ENGINE=InnoDB`,
  `CREATE TABLE trend_reason_weeks (
    week DATE NOT NULL, technician_id INT UNSIGNED NOT NULL, rubric_version INT UNSIGNED NOT NULL,
    stock_reason VARCHAR(120) NOT NULL, n INT UNSIGNED NOT NULL,
    PRIMARY KEY (week, technician_id, rubric_version, stock_reason), KEY (technician_id, week)
  ) ENGINE=InnoDB`,
  `CREATE TABLE trend_turnaround_weeks (
    week DATE NOT NULL, technician_id INT UNSIGNED NOT NULL, rubric_version INT UNSIGNED NOT NULL,
    hours INT NOT NULL, n INT UNSIGNED NOT NULL,
    PRIMARY KEY (week, technician_id, rubric_version, hours), KEY (technician_id, week)
  ) ENGINE=InnoDB`,
  `CREATE TABLE trend_reviewer_weeks (
    week DATE NOT NULL, reviewer_id INT UNSIGNED NOT NULL, reviews INT UNSIGNED NOT NULL, late INT UNSIGNED NOT NULL,
    PRIMARY KEY (week, reviewer_id)
  ) ENGINE=InnoDB`,
  `CREATE TABLE trend_reviewer_minutes (
    week DATE NOT NULL, reviewer_id INT UNSIGNED NOT NULL, minutes INT NOT NULL, n INT UNSIGNED NOT NULL,
    PRIMARY KEY (week, reviewer_id, minutes)
  ) ENGINE=InnoDB`,
];

const WEEK_OF = (at: string) => `DATE_SUB(DATE(${at}), INTERVAL WEEKDAY(${at}) DAY)`;

const TRIGGERS = {
  reviews_to_trend_rollups: `CREATE TRIGGER reviews_to_trend_rollups AFTER INSERT ON reviews FOR EACH ROW
  BEGIN
    DECLARE w DATE;
    DECLARE tech INT UNSIGNED;
    DECLARE visit DATE;
    DECLARE rv INT UNSIGNED;
    IF NEW.kind = 'primary' AND @sightline_skip_rollups IS NULL THEN
      SET w = ${WEEK_OF('NEW.decided_at')};
      SELECT technician_id, site_visit_date INTO tech, visit FROM jobs WHERE id = NEW.job_id;
      SELECT version INTO rv FROM rubrics WHERE id = NEW.rubric_id;
      INSERT INTO trend_technician_weeks VALUES (w, tech, rv, 1, COALESCE(NEW.score, 0), NEW.score IS NOT NULL,
        NEW.revision_number = 1, NEW.revision_number = 1 AND NEW.decision = 'accept',
        NEW.decision = 'rework', NEW.decision = 'recapture',
        NEW.decision = 'accept', IF(NEW.decision = 'accept', NEW.revision_number, 0))
      ON DUPLICATE KEY UPDATE reviews = reviews + 1, score_sum = score_sum + VALUES(score_sum), score_n = score_n + VALUES(score_n),
        first_total = first_total + VALUES(first_total), first_accepted = first_accepted + VALUES(first_accepted),
        rework = rework + VALUES(rework), recaptures = recaptures + VALUES(recaptures),
        accepted = accepted + VALUES(accepted), accepted_revision_sum = accepted_revision_sum + VALUES(accepted_revision_sum);
      IF NEW.decision = 'accept' AND visit IS NOT NULL THEN
        INSERT INTO trend_turnaround_weeks VALUES (w, tech, rv, TIMESTAMPDIFF(HOUR, visit, NEW.decided_at), 1)
        ON DUPLICATE KEY UPDATE n = n + 1;
      END IF;
      INSERT INTO trend_reviewer_weeks VALUES (w, NEW.reviewer_id, 1, COALESCE(NEW.decided_at > NEW.due_at, 0))
      ON DUPLICATE KEY UPDATE reviews = reviews + 1, late = late + VALUES(late);
      IF NEW.claimed_at IS NOT NULL THEN
        INSERT INTO trend_reviewer_minutes VALUES (w, NEW.reviewer_id, TIMESTAMPDIFF(MINUTE, NEW.claimed_at, NEW.decided_at), 1)
        ON DUPLICATE KEY UPDATE n = n + 1;
      END IF;
    END IF;
  END`,
  review_scores_to_trend_rollups: `CREATE TRIGGER review_scores_to_trend_rollups AFTER INSERT ON review_scores FOR EACH ROW
  BEGIN
    DECLARE w DATE;
    DECLARE tech INT UNSIGNED;
    DECLARE rv INT UNSIGNED;
    DECLARE k VARCHAR(20);
    IF (NEW.score < NEW.max_score OR NEW.stock_reason IS NOT NULL) AND @sightline_skip_rollups IS NULL THEN
      SELECT ${WEEK_OF('r.decided_at')}, j.technician_id, ru.version, r.kind INTO w, tech, rv, k
        FROM reviews r JOIN jobs j ON j.id = r.job_id JOIN rubrics ru ON ru.id = r.rubric_id WHERE r.id = NEW.review_id;
      IF k = 'primary' THEN
        IF NEW.score < NEW.max_score THEN
          INSERT INTO trend_criterion_weeks VALUES (w, tech, rv, NEW.criterion_key, 1) ON DUPLICATE KEY UPDATE below_full = below_full + 1;
        END IF;
        IF NEW.stock_reason IS NOT NULL THEN
          INSERT INTO trend_reason_weeks VALUES (w, tech, rv, NEW.stock_reason, 1) ON DUPLICATE KEY UPDATE n = n + 1;
        END IF;
      END IF;
    END IF;
  END`,
};

export async function up(queryInterface: QueryInterface) {
  const raw = (sql: string) => queryInterface.sequelize.query(sql, { type: QueryTypes.RAW });
  for (const sql of TABLES) await raw(sql);
  for (const sql of Object.values(TRIGGERS)) await raw(sql);
  for (const sql of REBUILD_STATEMENTS) await raw(sql);
}

export async function down(queryInterface: QueryInterface) {
  const raw = (sql: string) => queryInterface.sequelize.query(sql, { type: QueryTypes.RAW });
  for (const name of Object.keys(TRIGGERS)) await raw(`DROP TRIGGER IF EXISTS ${name}`);
  for (const sql of TABLES) await raw(`DROP TABLE IF EXISTS ${/CREATE TABLE (\w+)/.exec(sql)![1]}`);
}
