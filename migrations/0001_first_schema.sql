-- Undercroft store, schema version 1: inspections and what was entered in them.
-- Framing, loads and observation details are JSON in the interchange format's own shape
-- (docs/inspection-format.md), so the model has one definition.

CREATE TABLE inspections (
    id                TEXT PRIMARY KEY,
    format_version    INTEGER NOT NULL,
    address           TEXT NOT NULL DEFAULT '',
    year_built        INTEGER,
    client_name       TEXT NOT NULL DEFAULT '',
    client_email      TEXT NOT NULL DEFAULT '',
    client_phone      TEXT NOT NULL DEFAULT '',
    inspector_name    TEXT NOT NULL DEFAULT '',
    inspector_company TEXT NOT NULL DEFAULT '',
    inspector_license TEXT NOT NULL DEFAULT '',
    visit_date        TEXT NOT NULL,
    conditions        TEXT NOT NULL DEFAULT '',
    code_edition      TEXT NOT NULL,
    local_amendments  TEXT NOT NULL DEFAULT '',
    units             TEXT NOT NULL DEFAULT 'imperial',
    loads             TEXT NOT NULL DEFAULT '{}',
    created_at        TEXT NOT NULL,
    updated_at        TEXT NOT NULL,
    archived_at       TEXT
);

CREATE TABLE areas (
    id            TEXT PRIMARY KEY,
    inspection_id TEXT NOT NULL REFERENCES inspections(id) ON DELETE CASCADE,
    position      INTEGER NOT NULL,
    name          TEXT NOT NULL,
    kind          TEXT NOT NULL,
    loads         TEXT NOT NULL DEFAULT '{}',
    notes         TEXT NOT NULL DEFAULT ''
);
CREATE INDEX areas_by_inspection ON areas(inspection_id, position);

CREATE TABLE runs (
    id       TEXT PRIMARY KEY,
    area_id  TEXT NOT NULL REFERENCES areas(id) ON DELETE CASCADE,
    position INTEGER NOT NULL,
    label    TEXT NOT NULL,
    framing  TEXT NOT NULL DEFAULT '{}'
);
CREATE INDEX runs_by_area ON runs(area_id, position);

-- A joist of a run (run_id set) or a single member of an area (run_id null).
CREATE TABLE members (
    id       TEXT PRIMARY KEY,
    area_id  TEXT NOT NULL REFERENCES areas(id) ON DELETE CASCADE,
    run_id   TEXT REFERENCES runs(id) ON DELETE CASCADE,
    position INTEGER NOT NULL,
    label    TEXT NOT NULL,
    framing  TEXT NOT NULL DEFAULT '{}'
);
CREATE INDEX members_by_area ON members(area_id, run_id, position);

-- Notch, hole, bearing, sag readings, moisture, damage, lap, restraint or cut; on a run's
-- typical joist (run_id) or on a member (member_id), never both.
CREATE TABLE observations (
    id        TEXT PRIMARY KEY,
    run_id    TEXT REFERENCES runs(id) ON DELETE CASCADE,
    member_id TEXT REFERENCES members(id) ON DELETE CASCADE,
    position  INTEGER NOT NULL,
    kind      TEXT NOT NULL,
    data      TEXT NOT NULL,
    note      TEXT NOT NULL DEFAULT '',
    CHECK ((run_id IS NULL) <> (member_id IS NULL))
);
CREATE INDEX observations_by_run ON observations(run_id, position);
CREATE INDEX observations_by_member ON observations(member_id, position);

-- A photo of an area, run, member or observation. The files are named by content_hash.
CREATE TABLE photos (
    id            TEXT PRIMARY KEY,
    inspection_id TEXT NOT NULL REFERENCES inspections(id) ON DELETE CASCADE,
    attached_to   TEXT NOT NULL,
    position      INTEGER NOT NULL,
    caption       TEXT NOT NULL DEFAULT '',
    file          TEXT NOT NULL,
    content_hash  TEXT,
    width         INTEGER,
    height        INTEGER,
    original_ext  TEXT,
    created_at    TEXT NOT NULL
);
CREATE INDEX photos_by_inspection ON photos(inspection_id, attached_to, position);
CREATE INDEX photos_by_hash ON photos(content_hash);
