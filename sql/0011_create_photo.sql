-- Photos of the jar (a feeding or one of its rise checks) and of the crumb (a bake plan). The
-- images themselves live in S3-compatible storage under random keys that reveal nothing; a row
-- names its two objects (the display image and the thumbnail). Limits mirror
-- shared/src/contracts/photo.ts. A photo goes with its subject, its culture's log and its account.

CREATE TABLE photo (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  subject_type text NOT NULL CHECK (subject_type IN ('feeding', 'rise-check', 'bake-plan')),
  -- A rise check's photo names its feeding too, so the culture's strip reads one column.
  feeding_id uuid REFERENCES feeding (id) ON DELETE CASCADE,
  rise_check_id uuid REFERENCES rise_check (id) ON DELETE CASCADE,
  bake_plan_id uuid REFERENCES bake_plan (id) ON DELETE CASCADE,
  -- The culture whose log it is in. A bake's plan keeps its culture only loosely (SET NULL), so
  -- its photos do too; a feeding's photos go with the feeding anyway.
  culture_id uuid REFERENCES culture (id) ON DELETE SET NULL,
  caption text CHECK (length(caption) BETWEEN 1 AND 200 AND caption = btrim(caption)),
  -- Of the display image, px.
  width integer NOT NULL CHECK (width BETWEEN 1 AND 1600),
  height integer NOT NULL CHECK (height BETWEEN 1 AND 1600),
  display_key text NOT NULL UNIQUE,
  thumbnail_key text NOT NULL UNIQUE,
  created_at timestamptz NOT NULL DEFAULT now(),
  CHECK (
    CASE subject_type
      WHEN 'feeding' THEN feeding_id IS NOT NULL AND rise_check_id IS NULL AND bake_plan_id IS NULL
      WHEN 'rise-check' THEN feeding_id IS NOT NULL AND rise_check_id IS NOT NULL AND bake_plan_id IS NULL
      ELSE bake_plan_id IS NOT NULL AND feeding_id IS NULL AND rise_check_id IS NULL
    END
  )
);

-- A feeding's photos, a culture's strip (oldest first), a plan's photos; the cascades use them too.
CREATE INDEX photo_feeding_idx ON photo (feeding_id, created_at, id) WHERE feeding_id IS NOT NULL;
CREATE INDEX photo_rise_check_idx ON photo (rise_check_id) WHERE rise_check_id IS NOT NULL;
CREATE INDEX photo_bake_plan_idx ON photo (bake_plan_id, created_at, id) WHERE bake_plan_id IS NOT NULL;
CREATE INDEX photo_culture_idx ON photo (culture_id, created_at, id) WHERE culture_id IS NOT NULL;
CREATE INDEX photo_account_idx ON photo (account_id);

-- Objects whose photo row is gone, waiting to be removed from the bucket. A row-level trigger
-- fills it in the deleting transaction — whichever delete it was (a photo, a feeding, a culture,
-- an account; cascades fire row triggers too) — so no object key is lost if the process dies
-- between the commit and the bucket. The API empties it right after its own deletes and sweeps
-- what is left at start and hourly.
CREATE TABLE photo_object_trash (
  object_key text PRIMARY KEY,
  trashed_at timestamptz NOT NULL DEFAULT now()
);

CREATE FUNCTION photo_trash_objects() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO photo_object_trash (object_key)
  VALUES (OLD.display_key), (OLD.thumbnail_key)
  ON CONFLICT DO NOTHING;
  RETURN OLD;
END
$$;

CREATE TRIGGER photo_trash_objects AFTER DELETE ON photo FOR EACH ROW EXECUTE FUNCTION photo_trash_objects();
