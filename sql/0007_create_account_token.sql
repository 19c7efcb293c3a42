-- Single-use tokens sent by e-mail: password resets now, class invitations later. Only the
-- SHA-256 of the token is stored, so a copy of this table opens nothing; the token itself exists
-- only in the e-mailed link. A token is spent by setting used_at, in the same statement that
-- checks it is unspent and unexpired, so two uses of one link cannot both succeed.
CREATE TABLE account_token (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  purpose text NOT NULL CHECK (purpose IN ('password-reset', 'class-invite')),
  -- sha256 of the token, hex.
  token_hash text NOT NULL UNIQUE CHECK (token_hash ~ '^[0-9a-f]{64}$'),
  created_at timestamptz NOT NULL DEFAULT now(),
  expires_at timestamptz NOT NULL,
  used_at timestamptz,
  CHECK (expires_at > created_at)
);

CREATE INDEX account_token_account_idx ON account_token (account_id, purpose);
