import type { Migration } from '../umzug';

// The outbox: every e-mail is a row first and is sent by the worker afterwards, so a mail server
// that is down loses nothing. report_issues records each report sent for a visit, the nonce its
// signed link is bound to (a newer issue invalidates older links), and the customer's acknowledgement.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE emails (
      id serial PRIMARY KEY,
      visit_id integer REFERENCES visits (id) ON DELETE SET NULL,
      kind text NOT NULL CHECK (kind ~ '^[a-z][a-z_]{1,39}$'),
      to_address text NOT NULL CHECK (to_address ~ '^[^@[:space:]]+@[^@[:space:]]+$' AND length(to_address) <= 254),
      subject text NOT NULL CHECK (length(subject) BETWEEN 1 AND 300),
      html text NOT NULL,
      text text NOT NULL,
      status text NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'sending', 'sent', 'failed')),
      attempts integer NOT NULL DEFAULT 0 CHECK (attempts >= 0),
      last_error text,
      next_attempt_at timestamptz NOT NULL DEFAULT now(),
      sent_at timestamptz,
      message_id text,
      created_by integer REFERENCES users (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((status = 'sent') = (sent_at IS NOT NULL)),
      CHECK (status <> 'failed' OR last_error IS NOT NULL)
    );
    CREATE INDEX emails_due_idx ON emails (status, next_attempt_at);
    CREATE INDEX emails_visit_idx ON emails (visit_id, created_at);

    -- The files sent with a message, kept so the record shows exactly what the customer received.
    CREATE TABLE email_attachments (
      id serial PRIMARY KEY,
      email_id integer NOT NULL REFERENCES emails (id) ON DELETE CASCADE,
      filename text NOT NULL CHECK (filename ~ '^[A-Za-z0-9][A-Za-z0-9._ -]{0,120}$'),
      content_type text NOT NULL CHECK (length(content_type) BETWEEN 3 AND 100),
      content bytea NOT NULL CHECK (octet_length(content) > 0),
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX email_attachments_email_idx ON email_attachments (email_id);

    CREATE TABLE report_issues (
      id serial PRIMARY KEY,
      visit_id integer NOT NULL REFERENCES visits (id) ON DELETE CASCADE,
      issue_number integer NOT NULL CHECK (issue_number >= 1),
      nonce text NOT NULL CHECK (nonce ~ '^[A-Za-z0-9_-]{22,}$'),
      recipient text NOT NULL,
      email_id integer REFERENCES emails (id) ON DELETE SET NULL,
      expires_at timestamptz NOT NULL,
      acknowledged_at timestamptz,
      acknowledged_by text CHECK (acknowledged_by IS NULL OR length(acknowledged_by) <= 120),
      created_by integer REFERENCES users (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (visit_id, issue_number),
      CHECK (expires_at > created_at),
      CHECK (acknowledged_by IS NULL OR acknowledged_at IS NOT NULL)
    );
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE IF EXISTS report_issues;
    DROP TABLE IF EXISTS email_attachments;
    DROP TABLE IF EXISTS emails;
  `);
};
