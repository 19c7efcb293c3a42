-- An admin can disable an account: the session guard then refuses it and ends its sessions, and
-- sign-in refuses it. NULL: the account is in use.
ALTER TABLE account ADD COLUMN disabled_at timestamptz;
-- Bumped whenever the account's other sessions must end (password change or reset, disabling).
-- A session carries the number it was started with; the session guard refuses any other. Deleting
-- session rows alone is not enough: a request already under way on one of them saves its row
-- back when it answers (rolling sessions), which would bring the session back to life.
ALTER TABLE account ADD COLUMN session_epoch integer NOT NULL DEFAULT 0;

-- Counters of the sign-in brakes (api/src/auth/throttle/), in the database so that every API
-- process sees the same counts. `key` is a SHA-256 hex of what is counted (an address, an
-- e-mail), never the address or e-mail itself. A fixed window: `hits` since the window opened,
-- until `expires_at`; `blocked_until` set once the limit is passed.
CREATE TABLE auth_throttle (
  key text PRIMARY KEY,
  hits integer NOT NULL CHECK (hits >= 0),
  expires_at timestamptz NOT NULL,
  blocked_until timestamptz
);

CREATE INDEX auth_throttle_expires_at_idx ON auth_throttle (expires_at);

-- Addresses an account has signed in from successfully. The per-account failure limit does not
-- apply to them, so guesses at one account from elsewhere cannot lock its owner out at home.
CREATE TABLE sign_in_address (
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  address text NOT NULL,
  last_signed_in_at timestamptz NOT NULL DEFAULT now(),
  PRIMARY KEY (account_id, address)
);
