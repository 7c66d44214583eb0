-- Plans saved before the planner took the power factor from the datasheet (or 0.95) carry the
-- old default of 1, which under-counts the current: drop it so those plans use the same rule.
UPDATE "walls"
SET "plan_settings" = "plan_settings" #- '{supply,powerFactor}'
WHERE "plan_settings" IS NOT NULL
  AND ("plan_settings" -> 'supply' ->> 'powerFactor')::double precision = 1;
