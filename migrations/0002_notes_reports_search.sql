-- Schema version 2: the inspector's notes and overrides on findings, delivered reports,
-- settings, and a search key for the inspection list.

-- Findings are computed, not stored; a note is keyed by the finding's identity
-- (rule id / member id / observation id).
CREATE TABLE finding_notes (
    inspection_id         TEXT NOT NULL REFERENCES inspections(id) ON DELETE CASCADE,
    finding_key           TEXT NOT NULL,
    note                  TEXT NOT NULL DEFAULT '',
    recommendation        TEXT,
    not_applicable_reason TEXT,
    updated_at            TEXT NOT NULL,
    PRIMARY KEY (inspection_id, finding_key)
);

-- A report handed to the client: when, which file, its hash, and the findings as delivered.
CREATE TABLE reports (
    id            TEXT PRIMARY KEY,
    inspection_id TEXT NOT NULL REFERENCES inspections(id) ON DELETE CASCADE,
    delivered_at  TEXT NOT NULL,
    file_name     TEXT NOT NULL,
    sha256        TEXT NOT NULL,
    bytes         INTEGER NOT NULL,
    findings      TEXT NOT NULL DEFAULT '[]'
);
CREATE INDEX reports_by_inspection ON reports(inspection_id, delivered_at);

CREATE TABLE settings (
    key   TEXT PRIMARY KEY,
    value TEXT NOT NULL
);

-- Lower-cased address and client for search, kept current by the store. SQLite's lower()
-- folds ASCII only, so the migration runner refills it with Unicode lower case after this
-- file runs, in the same transaction.
ALTER TABLE inspections ADD COLUMN search_key TEXT NOT NULL DEFAULT '';
CREATE INDEX inspections_by_update ON inspections(archived_at, updated_at);
