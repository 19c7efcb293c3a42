-- Idempotency keys are now kept 7 days (was 24 hours) and swept hourly for every account by
-- api/src/common/idempotency/idempotency.sweeper.ts, not only when the same account writes again.
-- The sweep finds expired rows by created_at.
CREATE INDEX idempotency_key_created_at_idx ON idempotency_key (created_at);

COMMENT ON TABLE idempotency_key IS
  'One row per Idempotency-Key an account sent with a write; kept 7 days from created_at, then swept.';
