-- A signed inspection is evidence: nobody, not even the app's own database user, may change or
-- delete it or its answers afterwards. The app answers 409 first; these triggers are the floor.
CREATE TRIGGER inspections_signed_no_update BEFORE UPDATE ON inspections FOR EACH ROW
BEGIN
  IF OLD.signed_at IS NOT NULL THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed inspections are read-only';
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER inspections_signed_no_delete BEFORE DELETE ON inspections FOR EACH ROW
BEGIN
  IF OLD.signed_at IS NOT NULL THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed inspections are read-only';
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER inspection_answers_signed_no_insert BEFORE INSERT ON inspection_answers FOR EACH ROW
BEGIN
  IF (SELECT signed_at FROM inspections WHERE id = NEW.inspection_id) IS NOT NULL THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed inspections are read-only';
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER inspection_answers_signed_no_update BEFORE UPDATE ON inspection_answers FOR EACH ROW
BEGIN
  IF (SELECT signed_at FROM inspections WHERE id = OLD.inspection_id) IS NOT NULL THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed inspections are read-only';
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER inspection_answers_signed_no_delete BEFORE DELETE ON inspection_answers FOR EACH ROW
BEGIN
  IF (SELECT signed_at FROM inspections WHERE id = OLD.inspection_id) IS NOT NULL THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed inspections are read-only';
  END IF;
END;
