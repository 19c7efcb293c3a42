-- Bench: bake plans made from a formula and (optionally) a culture, the steps the baker checked
-- off and the dough readings taken during bulk. The plan keeps the planner's input as it was at
-- creation (the dough worked out from the formula, the culture's kinetics at that moment), so
-- editing or deleting the formula or the culture later never changes a plan. Limits mirror
-- shared/src/contracts/bake-plan.ts. Private to the owning account and deleted with it.

CREATE TABLE bake_plan (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  formula_id uuid REFERENCES formula (id) ON DELETE SET NULL,
  culture_id uuid REFERENCES culture (id) ON DELETE SET NULL,
  name text NOT NULL CHECK (length(name) BETWEEN 1 AND 80 AND name = btrim(name)),
  status text NOT NULL DEFAULT 'active' CHECK (status IN ('active', 'finished', 'cancelled')),
  -- What the baker chose on the form (BakePlanSettings), as sent.
  settings jsonb NOT NULL CHECK (jsonb_typeof(settings) = 'object'),
  -- The planner's input (PlanInput) frozen at creation: dough and kinetics snapshot included.
  input jsonb NOT NULL CHECK (jsonb_typeof(input) = 'object'),
  -- The chosen option's timing (PlanTiming): with the input it reproduces the plan.
  timing jsonb NOT NULL CHECK (jsonb_typeof(timing) = 'object'),
  -- When the bread was to be ready, as planned at creation (the list shows it).
  ready_at timestamptz NOT NULL,
  kinetics_basis text NOT NULL CHECK (kinetics_basis IN ('culture', 'default')),
  dairy_or_egg boolean NOT NULL DEFAULT false,
  notes text CHECK (length(notes) BETWEEN 1 AND 4000),
  rating integer CHECK (rating BETWEEN 1 AND 5),
  -- The culture feeding that leavened the bake (the API keeps it to the plan's culture).
  feeding_id uuid REFERENCES feeding (id) ON DELETE SET NULL,
  finished_at timestamptz,
  cancelled_at timestamptz,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  CHECK ((status = 'finished') = (finished_at IS NOT NULL)),
  CHECK ((status = 'cancelled') = (cancelled_at IS NOT NULL))
);

-- The list: newest first, optionally one status.
CREATE INDEX bake_plan_account_created_idx ON bake_plan (account_id, created_at DESC, id);
-- ON DELETE SET NULL looks plans up by these.
CREATE INDEX bake_plan_formula_idx ON bake_plan (formula_id) WHERE formula_id IS NOT NULL;
CREATE INDEX bake_plan_culture_idx ON bake_plan (culture_id) WHERE culture_id IS NOT NULL;
CREATE INDEX bake_plan_feeding_idx ON bake_plan (feeding_id) WHERE feeding_id IS NOT NULL;

-- A step checked off with its actual times; step_id is the planner's stable id ("mix", "fold-2").
CREATE TABLE bake_plan_step (
  plan_id uuid NOT NULL REFERENCES bake_plan (id) ON DELETE CASCADE,
  step_id text NOT NULL CHECK (step_id ~ '^[a-z][a-z0-9-]{0,39}$'),
  started_at timestamptz NOT NULL CHECK (started_at >= TIMESTAMPTZ '2000-01-01 00:00:00+00'),
  -- Null: the step took its planned length from started_at.
  ended_at timestamptz CHECK (ended_at >= started_at),
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  PRIMARY KEY (plan_id, step_id)
);

-- A look at the dough during bulk: its temperature, the aliquot jar's rise, or both.
CREATE TABLE dough_reading (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  plan_id uuid NOT NULL REFERENCES bake_plan (id) ON DELETE CASCADE,
  taken_at timestamptz NOT NULL CHECK (taken_at >= TIMESTAMPTZ '2000-01-01 00:00:00+00'),
  temperature_c double precision CHECK (temperature_c BETWEEN 0 AND 40),
  -- (height ÷ height at mixing − 1) × 100.
  rise_pct double precision CHECK (rise_pct BETWEEN 0 AND 400),
  created_at timestamptz NOT NULL DEFAULT now(),
  CHECK (temperature_c IS NOT NULL OR rise_pct IS NOT NULL)
);

CREATE INDEX dough_reading_plan_taken_at_idx ON dough_reading (plan_id, taken_at, id);
