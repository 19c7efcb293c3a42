-- Formulas: a baker's saved formulas as typed (amounts in any unit, by weight or volume), the
-- flour blend in parts, and a default batch size. Grams and percentages are computed on read
-- from these inputs, never stored. Limits mirror shared/src/contracts/formula.ts. Private to the
-- owning account and deleted with it.

CREATE TABLE formula (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  name text NOT NULL CHECK (length(name) BETWEEN 1 AND 80 AND name = btrim(name)),
  notes text CHECK (length(notes) BETWEEN 1 AND 2000),
  -- The default batch: by a factor, to a total dough weight, or pieces × piece weight (+ loss).
  scale_by text CHECK (scale_by IN ('factor', 'dough-weight', 'pieces')),
  scale_factor double precision CHECK (scale_factor > 0 AND scale_factor <= 100),
  scale_dough_g double precision CHECK (scale_dough_g > 0 AND scale_dough_g <= 500000),
  scale_pieces integer CHECK (scale_pieces BETWEEN 1 AND 1000),
  scale_piece_g double precision CHECK (scale_piece_g > 0 AND scale_piece_g <= 20000),
  scale_loss_pct double precision CHECK (scale_loss_pct >= 0 AND scale_loss_pct < 50),
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  -- Each way of scaling carries exactly what it needs.
  CHECK (
    (scale_by IS NULL AND scale_factor IS NULL AND scale_dough_g IS NULL AND scale_pieces IS NULL
      AND scale_piece_g IS NULL AND scale_loss_pct IS NULL)
    OR (scale_by = 'factor' AND scale_factor IS NOT NULL AND scale_dough_g IS NULL AND scale_pieces IS NULL
      AND scale_piece_g IS NULL AND scale_loss_pct IS NULL)
    OR (scale_by = 'dough-weight' AND scale_dough_g IS NOT NULL AND scale_factor IS NULL AND scale_pieces IS NULL
      AND scale_piece_g IS NULL AND scale_loss_pct IS NULL)
    OR (scale_by = 'pieces' AND scale_pieces IS NOT NULL AND scale_piece_g IS NOT NULL AND scale_factor IS NULL
      AND scale_dough_g IS NULL)
  )
);

-- The list: newest change first.
CREATE INDEX formula_account_updated_idx ON formula (account_id, updated_at DESC, id);

CREATE TABLE formula_ingredient (
  formula_id uuid NOT NULL REFERENCES formula (id) ON DELETE CASCADE,
  -- Order as typed, from 0.
  position integer NOT NULL CHECK (position BETWEEN 0 AND 39),
  kind text NOT NULL CHECK (
    kind IN ('flour', 'water', 'starter', 'milk', 'butter', 'egg', 'sugar', 'salt', 'yeast', 'inclusion', 'other')
  ),
  name text NOT NULL CHECK (length(name) BETWEEN 1 AND 80 AND name = btrim(name)),
  amount double precision NOT NULL CHECK (amount > 0 AND amount <= 100000),
  unit text NOT NULL CHECK (
    unit IN ('g', 'kg', 'oz', 'lb', 'ml', 'l', 'tsp', 'tbsp', 'fl oz', 'cup', 'pint', 'quart', 'gallon',
      'stick', 'pat', 'packet', 'cake', 'dash')
  ),
  -- A food of the model's catalogue (USDA weights); the API checks the id.
  food text CHECK (length(food) BETWEEN 1 AND 60),
  -- g/mL the baker measured for their own flour.
  grams_per_ml double precision CHECK (grams_per_ml >= 0.05 AND grams_per_ml <= 3),
  starter_hydration_pct double precision CHECK (starter_hydration_pct > 0 AND starter_hydration_pct <= 1000),
  PRIMARY KEY (formula_id, position),
  CHECK (starter_hydration_pct IS NULL OR kind = 'starter')
);

CREATE TABLE formula_blend_flour (
  formula_id uuid NOT NULL REFERENCES formula (id) ON DELETE CASCADE,
  position integer NOT NULL CHECK (position BETWEEN 0 AND 9),
  name text NOT NULL CHECK (length(name) BETWEEN 1 AND 80 AND name = btrim(name)),
  parts double precision NOT NULL CHECK (parts > 0 AND parts <= 1000),
  PRIMARY KEY (formula_id, position)
);
