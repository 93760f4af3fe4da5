-- Schema version 7: who a delivered report went to, and the marks drawn on a photo (arrows,
-- circles, measured dimensions) as their own layer, the photo's files untouched.

ALTER TABLE reports ADD COLUMN recipient TEXT NOT NULL DEFAULT '';
ALTER TABLE photos ADD COLUMN marks TEXT NOT NULL DEFAULT '[]';
