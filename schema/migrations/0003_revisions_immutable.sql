-- A study revision is a frozen record that reviews and decisions point at: the API has no update
-- path for it, and this trigger makes the database refuse one too. Deletes stay possible, since a
-- deleted study takes its revisions with it (ON DELETE CASCADE; a BEFORE DELETE trigger would
-- block that). The one change allowed is created_by going to NULL, which is what ON DELETE SET
-- NULL does when the author's account is deleted; the revision's content stays as it was.
CREATE FUNCTION "study_revisions_refuse_update"() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF NEW."created_by" IS NULL
    AND (to_jsonb(NEW) - 'created_by') = (to_jsonb(OLD) - 'created_by') THEN
    RETURN NEW;
  END IF;
  RAISE EXCEPTION 'study revision % is immutable: a revision is never updated', OLD."id"
    USING ERRCODE = 'integrity_constraint_violation';
END;
$$;--> statement-breakpoint
CREATE TRIGGER "study_revisions_immutable"
  BEFORE UPDATE ON "study_revisions"
  FOR EACH ROW EXECUTE FUNCTION "study_revisions_refuse_update"();
