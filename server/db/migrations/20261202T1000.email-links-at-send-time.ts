import type { Migration } from '../umzug';

// A stored e-mail keeps no live credential. Its body carries the marker {{link}} and the row names
// what the link is made from (an invitation or a report issue); the outbox worker renders the link
// from a server-side key when it sends. An invitation's token is an HMAC of its nonce under that key,
// so the table holds the nonce and the token's SHA-256, never the token.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    ALTER TABLE emails
      ADD COLUMN link_kind text CHECK (link_kind IN ('invite', 'report')),
      ADD COLUMN link_ref integer,
      ADD CHECK ((link_kind IS NULL) = (link_ref IS NULL));
    ALTER TABLE user_invites ADD COLUMN nonce text CHECK (nonce IS NULL OR nonce ~ '^[A-Za-z0-9_-]{22,}$');

    -- Report e-mails already stored: their link can be signed again from the issue, so point at it.
    UPDATE emails e SET
        link_kind = 'report', link_ref = ri.id,
        html = regexp_replace(e.html, 'https?://[^[:space:]"<>]*/report/[A-Za-z0-9_-]+', '{{link}}', 'g'),
        text = regexp_replace(e.text, 'https?://[^[:space:]"<>]*/report/[A-Za-z0-9_-]+', '{{link}}', 'g')
      FROM report_issues ri
     WHERE ri.email_id = e.id AND e.kind = 'visit_report';

    -- Invitations already stored: their token cannot be made again, so it is removed, and one not yet
    -- sent is not sent (an administrator re-issues it).
    UPDATE emails SET
        html = regexp_replace(html, 'https?://[^[:space:]"<>]*/accept-invite/[A-Za-z0-9_-]+', '(link removed: ask an administrator for a new invitation)', 'g'),
        text = regexp_replace(text, 'https?://[^[:space:]"<>]*/accept-invite/[A-Za-z0-9_-]+', '(link removed: ask an administrator for a new invitation)', 'g')
     WHERE kind = 'user_invite';
    UPDATE emails SET status = 'failed', last_error = 'Not sent: stored before invitation links were made at send time. Send a new invitation from People.'
     WHERE kind = 'user_invite' AND status IN ('queued', 'sending');
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    ALTER TABLE user_invites DROP COLUMN IF EXISTS nonce;
    ALTER TABLE emails DROP COLUMN IF EXISTS link_ref, DROP COLUMN IF EXISTS link_kind;
  `);
};
