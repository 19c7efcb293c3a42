-- A kitchen logger's room temperatures during a bake. The live plan turns them into the dough's
-- estimated temperatures (the dough follows the room slowly); measured dough temperatures stay in
-- dough_reading. One reading per instant, so importing the same file twice adds nothing.
CREATE TABLE kitchen_reading (
  plan_id uuid NOT NULL REFERENCES bake_plan (id) ON DELETE CASCADE,
  taken_at timestamptz NOT NULL CHECK (taken_at >= TIMESTAMPTZ '2000-01-01 00:00:00+00'),
  temperature_c double precision NOT NULL CHECK (temperature_c BETWEEN -5 AND 50),
  created_at timestamptz NOT NULL DEFAULT now(),
  PRIMARY KEY (plan_id, taken_at)
);

-- When the photo was taken, from the camera's own record (EXIF DateTimeOriginal with its offset,
-- or read in the baker's zone), before the metadata is stripped; null when the file does not say.
-- The culture's strip orders by it, falling back to the upload time.
ALTER TABLE photo ADD COLUMN taken_at timestamptz;
