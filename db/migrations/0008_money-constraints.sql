-- Stock on hand (the sum of a part's movements) never goes below zero unless the workshop allows it.
-- The trigger locks the part row before summing, so concurrent uses of the last units run one after
-- another and each sees the others' committed movements (READ COMMITTED takes a new snapshot per statement).
CREATE FUNCTION stock_on_hand_not_negative() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  on_hand bigint;
BEGIN
  IF NEW.quantity_milli >= 0 OR (SELECT allow_negative_stock FROM workshops WHERE id = NEW.workshop_id) THEN
    RETURN NULL;
  END IF;
  PERFORM 1 FROM parts WHERE id = NEW.part_id FOR UPDATE;
  SELECT coalesce(sum(quantity_milli), 0) INTO on_hand FROM stock_movements WHERE part_id = NEW.part_id;
  IF on_hand < 0 THEN
    RAISE EXCEPTION 'stock of part % would go below zero', NEW.part_id
      USING ERRCODE = 'check_violation', CONSTRAINT = 'stock_movements_on_hand_not_negative';
  END IF;
  RETURN NULL;
END $$;--> statement-breakpoint
CREATE TRIGGER stock_movements_on_hand_not_negative AFTER INSERT ON stock_movements
  FOR EACH ROW EXECUTE FUNCTION stock_on_hand_not_negative();--> statement-breakpoint
-- The stock ledger is append-only: a mistake is put right by another movement. Rows go only with their workshop.
CREATE FUNCTION stock_movements_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' AND NOT EXISTS (SELECT 1 FROM workshops WHERE id = OLD.workshop_id) THEN
    RETURN OLD;
  END IF;
  RAISE EXCEPTION 'stock movements cannot be changed or removed'
    USING ERRCODE = 'check_violation', CONSTRAINT = 'stock_movements_append_only';
END $$;--> statement-breakpoint
CREATE TRIGGER stock_movements_append_only BEFORE UPDATE OR DELETE ON stock_movements
  FOR EACH ROW EXECUTE FUNCTION stock_movements_append_only();--> statement-breakpoint
-- Lines and options of an estimate that is no longer a draft are frozen. The one column named in
-- the trigger's argument may still change (a labour line's task, an option's chosen flag, set on
-- acceptance). Rows of an estimate being deleted with its job go with it.
CREATE FUNCTION estimate_content_frozen() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  parent_status estimate_status;
  settable text := TG_ARGV[0];
BEGIN
  SELECT status INTO parent_status FROM estimates
    WHERE id = CASE WHEN TG_OP = 'DELETE' THEN OLD.estimate_id ELSE NEW.estimate_id END;
  IF parent_status IS NULL OR parent_status = 'draft' THEN
    RETURN CASE WHEN TG_OP = 'DELETE' THEN OLD ELSE NEW END;
  END IF;
  IF TG_OP = 'UPDATE' AND NEW.estimate_id = OLD.estimate_id AND (to_jsonb(NEW) - settable) = (to_jsonb(OLD) - settable) THEN
    RETURN NEW;
  END IF;
  RAISE EXCEPTION 'estimate % is no longer a draft', CASE WHEN TG_OP = 'DELETE' THEN OLD.estimate_id ELSE NEW.estimate_id END
    USING ERRCODE = 'check_violation', CONSTRAINT = 'estimate_content_frozen';
END $$;--> statement-breakpoint
CREATE TRIGGER estimate_lines_frozen BEFORE INSERT OR UPDATE OR DELETE ON estimate_lines
  FOR EACH ROW EXECUTE FUNCTION estimate_content_frozen('task_id');--> statement-breakpoint
CREATE TRIGGER estimate_options_frozen BEFORE INSERT OR UPDATE OR DELETE ON estimate_options
  FOR EACH ROW EXECUTE FUNCTION estimate_content_frozen('is_chosen');
