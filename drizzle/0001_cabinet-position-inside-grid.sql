-- A cabinet's position must lie inside its wall's grid, and a wall's grid cannot shrink past
-- the cabinets placed on it. A CHECK cannot read another table, so triggers enforce both.
-- Violations raise SQLSTATE 23514 (check_violation) with the constraint name below, which the
-- API turns into a 400 that names the field.
CREATE OR REPLACE FUNCTION gridkeep_cabinet_inside_grid() RETURNS trigger AS $$
DECLARE
  grid_columns integer;
  grid_rows integer;
BEGIN
  IF NEW.wall_id IS NULL THEN
    RETURN NEW;
  END IF;
  SELECT columns, rows INTO grid_columns, grid_rows FROM walls WHERE id = NEW.wall_id;
  IF NEW.column > grid_columns OR NEW.row > grid_rows THEN
    RAISE EXCEPTION 'position C%·R% is outside the wall''s % × % grid', NEW.column, NEW.row, grid_columns, grid_rows
      USING ERRCODE = 'check_violation', CONSTRAINT = 'cabinets_position_inside_grid', TABLE = 'cabinets';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER cabinets_position_inside_grid
  BEFORE INSERT OR UPDATE OF wall_id, "column", "row" ON cabinets
  FOR EACH ROW EXECUTE FUNCTION gridkeep_cabinet_inside_grid();
--> statement-breakpoint
CREATE OR REPLACE FUNCTION gridkeep_wall_grid_holds_cabinets() RETURNS trigger AS $$
BEGIN
  IF EXISTS (
    SELECT 1 FROM cabinets
    WHERE wall_id = NEW.id AND ("column" > NEW.columns OR "row" > NEW.rows)
  ) THEN
    RAISE EXCEPTION 'the grid cannot shrink to % × %: cabinets sit outside it', NEW.columns, NEW.rows
      USING ERRCODE = 'check_violation', CONSTRAINT = 'walls_grid_holds_cabinets', TABLE = 'walls';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER walls_grid_holds_cabinets
  BEFORE UPDATE OF columns, rows ON walls
  FOR EACH ROW EXECUTE FUNCTION gridkeep_wall_grid_holds_cabinets();
