-- Schema version 8: what this device has pushed to the firm's office, so a sync sends only
-- what changed and names the revision it started from. The office's own address and the
-- firm's settings are kept in the settings table.

CREATE TABLE office_pushes (
    inspection_id TEXT PRIMARY KEY REFERENCES inspections(id) ON DELETE CASCADE,
    content_sha256 TEXT NOT NULL,
    revision INTEGER NOT NULL,
    pushed_at TEXT NOT NULL
);
