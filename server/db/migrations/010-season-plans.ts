// Season plans: one plan per farm and season, its actions per field, the review conversation,
// and a frozen copy of every approved revision (what a landowner reads).
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE plans (
      id serial PRIMARY KEY,
      farm_id integer NOT NULL REFERENCES farms(id) ON DELETE CASCADE,
      season_id integer NOT NULL UNIQUE REFERENCES seasons(id) ON DELETE CASCADE,
      state text NOT NULL DEFAULT 'draft' CHECK (state IN ('draft', 'submitted', 'returned', 'approved')),
      version integer NOT NULL DEFAULT 1,
      revision integer NOT NULL DEFAULT 1,
      currency text NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      submitted_by integer REFERENCES users(id) ON DELETE SET NULL,
      submitted_at timestamptz,
      returned_by integer REFERENCES users(id) ON DELETE SET NULL,
      returned_at timestamptz,
      approved_by integer REFERENCES users(id) ON DELETE SET NULL,
      approved_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX plans_farm_idx ON plans (farm_id);

    CREATE TABLE plan_actions (
      id serial PRIMARY KEY,
      plan_id integer NOT NULL REFERENCES plans(id) ON DELETE CASCADE,
      field_id integer NOT NULL REFERENCES fields(id) ON DELETE CASCADE,
      treatment text NOT NULL,
      title text NOT NULL,
      quantity double precision CHECK (quantity >= 0),
      unit text,
      cost double precision CHECK (cost >= 0),
      currency text NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
      planned_on date,
      planned_from date,
      planned_to date,
      done_by text,
      status text NOT NULL DEFAULT 'planned' CHECK (status IN ('planned', 'done', 'checked')),
      notes text,
      version integer NOT NULL DEFAULT 1,
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      updated_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (planned_on IS NULL OR (planned_from IS NULL AND planned_to IS NULL)),
      CHECK (planned_from IS NULL OR planned_to IS NULL OR planned_from <= planned_to)
    );
    CREATE INDEX plan_actions_plan_idx ON plan_actions (plan_id);
    CREATE INDEX plan_actions_field_idx ON plan_actions (field_id);

    CREATE TABLE plan_comments (
      id serial PRIMARY KEY,
      plan_id integer NOT NULL REFERENCES plans(id) ON DELETE CASCADE,
      action_id integer REFERENCES plan_actions(id) ON DELETE SET NULL,
      revision integer NOT NULL,
      kind text NOT NULL DEFAULT 'comment' CHECK (kind IN ('comment', 'return', 'approval')),
      author_id integer REFERENCES users(id) ON DELETE SET NULL,
      body text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX plan_comments_plan_idx ON plan_comments (plan_id);

    CREATE TABLE plan_versions (
      id serial PRIMARY KEY,
      plan_id integer NOT NULL REFERENCES plans(id) ON DELETE CASCADE,
      revision integer NOT NULL,
      snapshot jsonb NOT NULL,
      approved_by integer REFERENCES users(id) ON DELETE SET NULL,
      approved_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (plan_id, revision)
    );
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    DROP TABLE plan_versions;
    DROP TABLE plan_comments;
    DROP TABLE plan_actions;
    DROP TABLE plans;
  `);
}
