-- One row per Idempotency-Key an account sent with a write (api/src/common/idempotency/). A retry
-- with the same key and the same request gets the stored response instead of a second write.
-- Rows older than 24 hours are expired: they are ignored and deleted on the account's next claim.
CREATE TABLE idempotency_key (
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  key text NOT NULL CHECK (length(key) BETWEEN 1 AND 255),
  method text NOT NULL,
  path text NOT NULL,
  -- sha256 of the request body in canonical JSON (keys sorted), hex.
  request_hash text NOT NULL,
  -- Both null while the first request is still running; set together when it succeeds.
  status_code integer CHECK (status_code BETWEEN 200 AND 299),
  -- json, not jsonb: jsonb reorders keys, and a replay must be the same body byte for byte.
  response_body json,
  created_at timestamptz NOT NULL DEFAULT now(),
  completed_at timestamptz,
  PRIMARY KEY (account_id, key),
  CHECK ((status_code IS NULL) = (completed_at IS NULL))
);
