-- Schema version 6: where a joist of a run is, measured along the run from its start (the
-- joist walk steps by position, not by count). NULL: not placed (entered by label only).

ALTER TABLE members ADD COLUMN at_inches REAL;
