-- The Idempotency-Key a feeding or rise check was created with. A write run again after a crash
-- (its row committed, its stored response lost, the claim taken over) looks for a row made with
-- its key within the key's lifetime and answers with it instead of adding a second. Null for rows
-- made without a key (imports, the seed).
ALTER TABLE feeding ADD COLUMN idempotency_key text;
CREATE INDEX feeding_idempotency_key_idx ON feeding (culture_id, idempotency_key) WHERE idempotency_key IS NOT NULL;

ALTER TABLE rise_check ADD COLUMN idempotency_key text;
CREATE INDEX rise_check_idempotency_key_idx ON rise_check (feeding_id, idempotency_key)
  WHERE idempotency_key IS NOT NULL;
