// Users, farms, memberships (per-farm roles), fields (PostGIS MULTIPOLYGON 4326) and audit events.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE EXTENSION IF NOT EXISTS postgis;
    CREATE TABLE users (
      id serial PRIMARY KEY,
      email text NOT NULL UNIQUE CHECK (email = lower(email)),
      name text NOT NULL,
      password_hash text NOT NULL,
      units text NOT NULL DEFAULT 'ha' CHECK (units IN ('ha', 'ac')),
      is_admin boolean NOT NULL DEFAULT false,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE farms (
      id serial PRIMARY KEY,
      name text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE memberships (
      id serial PRIMARY KEY,
      user_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      farm_id integer NOT NULL REFERENCES farms(id) ON DELETE CASCADE,
      role text NOT NULL CHECK (role IN ('farmer', 'advisor', 'landowner')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (user_id, farm_id)
    );
    CREATE TABLE fields (
      id serial PRIMARY KEY,
      farm_id integer NOT NULL REFERENCES farms(id) ON DELETE CASCADE,
      name text NOT NULL,
      geom geometry(MULTIPOLYGON, 4326) NOT NULL,
      area_m2 double precision NOT NULL,
      perimeter_m double precision NOT NULL,
      owner_membership_id integer REFERENCES memberships(id) ON DELETE SET NULL,
      version integer NOT NULL DEFAULT 0,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX fields_geom_gist ON fields USING gist (geom);
    CREATE INDEX fields_farm_id ON fields (farm_id);
    CREATE TABLE audit_events (
      id bigserial PRIMARY KEY,
      user_id integer REFERENCES users(id) ON DELETE SET NULL,
      farm_id integer REFERENCES farms(id) ON DELETE CASCADE,
      entity text NOT NULL,
      entity_id integer,
      action text NOT NULL,
      detail jsonb NOT NULL DEFAULT '{}'::jsonb,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX audit_events_farm ON audit_events (farm_id, created_at);
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('DROP TABLE audit_events, fields, memberships, farms, users CASCADE');
}
