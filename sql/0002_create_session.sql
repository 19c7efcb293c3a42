-- Server-side sessions, in the layout connect-pg-simple reads and writes.
CREATE TABLE session (
  sid varchar NOT NULL PRIMARY KEY,
  sess json NOT NULL,
  expire timestamptz NOT NULL
);

CREATE INDEX session_expire_idx ON session (expire);
-- Lets us end every session of one account (password change, role change).
CREATE INDEX session_account_idx ON session ((sess ->> 'accountId'));
