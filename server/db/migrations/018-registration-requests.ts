// Signing up by mail: a request to create an account waits here until the link mailed to the
// address is opened, so the answer to "create an account" is the same whether or not the
// address already has one. A request for an address that has an account keeps no password and
// no link; it only counts towards the address's limit and sends its owner a notice.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE registration_requests (
      id serial PRIMARY KEY,
      email text NOT NULL,
      name text NOT NULL,
      farm_name text NOT NULL,
      password_hash text,
      token_hash text UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((password_hash IS NULL) = (token_hash IS NULL))
    );
    CREATE INDEX registration_requests_email_idx ON registration_requests (email, created_at);
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('DROP TABLE registration_requests;');
}
