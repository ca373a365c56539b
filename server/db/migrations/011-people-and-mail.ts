// People and mail: server-side sessions (so signing out, a new password or a removal ends access
// at once), farm invitations and password resets (one-time tokens stored as SHA-256 hashes), the
// outbox of mail the job queue sends, what the local fake mail server received, and each person's
// choice of notices.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE user_sessions (
      id bigserial PRIMARY KEY,
      user_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash text NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX user_sessions_user_idx ON user_sessions (user_id);

    CREATE TABLE invitations (
      id serial PRIMARY KEY,
      farm_id integer NOT NULL REFERENCES farms(id) ON DELETE CASCADE,
      email text NOT NULL CHECK (email = lower(email)),
      role text NOT NULL CHECK (role IN ('farmer', 'advisor', 'landowner')),
      field_ids integer[] NOT NULL DEFAULT '{}',
      token_hash text NOT NULL UNIQUE,
      invited_by integer REFERENCES users(id) ON DELETE SET NULL,
      expires_at timestamptz NOT NULL,
      accepted_at timestamptz,
      accepted_by integer REFERENCES users(id) ON DELETE SET NULL,
      cancelled_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX invitations_farm_idx ON invitations (farm_id);
    CREATE INDEX invitations_email_idx ON invitations (email, created_at);
    CREATE INDEX invitations_sender_idx ON invitations (invited_by, created_at);

    CREATE TABLE password_resets (
      id serial PRIMARY KEY,
      user_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash text NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX password_resets_user_idx ON password_resets (user_id, created_at);

    CREATE TABLE outgoing_mails (
      id bigserial PRIMARY KEY,
      kind text NOT NULL,
      to_address text NOT NULL,
      subject text NOT NULL,
      text_body text NOT NULL,
      html_body text NOT NULL,
      user_id integer REFERENCES users(id) ON DELETE SET NULL,
      farm_id integer REFERENCES farms(id) ON DELETE SET NULL,
      -- One reminder per action and date, one digest per farm and day.
      dedupe_key text UNIQUE,
      state text NOT NULL DEFAULT 'queued' CHECK (state IN ('queued', 'sending', 'sent', 'failed')),
      attempts integer NOT NULL DEFAULT 0,
      last_error text,
      sent_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX outgoing_mails_state_idx ON outgoing_mails (state, created_at);

    CREATE TABLE dev_mailbox_messages (
      id bigserial PRIMARY KEY,
      envelope_from text NOT NULL,
      envelope_to text[] NOT NULL,
      to_header text NOT NULL,
      subject text NOT NULL,
      text_body text NOT NULL,
      html_body text NOT NULL,
      received_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE notice_settings (
      user_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      kind text NOT NULL CHECK (kind IN ('plan-submitted', 'plan-returned', 'plan-approved', 'action-reminder', 'advisor-digest')),
      enabled boolean NOT NULL,
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (user_id, kind)
    );
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    DROP TABLE notice_settings;
    DROP TABLE dev_mailbox_messages;
    DROP TABLE outgoing_mails;
    DROP TABLE password_resets;
    DROP TABLE invitations;
    DROP TABLE user_sessions;
  `);
}
