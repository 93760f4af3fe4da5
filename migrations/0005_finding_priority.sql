-- Schema version 5: the inspector's priority for a finding (who acts and how soon), kept with
-- the note on the finding. NULL: the priority set from the finding's basis and status.

ALTER TABLE finding_notes ADD COLUMN priority TEXT;
