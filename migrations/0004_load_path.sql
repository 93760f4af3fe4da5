-- Schema version 4: the load path under the joists. Girder lines and their posts, the
-- conditions of the space under the framing, and the girders a joist run bears on.
-- Details are JSON in the interchange format's own shape, as for framing.

CREATE TABLE girders (
    id       TEXT PRIMARY KEY,
    area_id  TEXT NOT NULL REFERENCES areas(id) ON DELETE CASCADE,
    position INTEGER NOT NULL,
    label    TEXT NOT NULL,
    data     TEXT NOT NULL DEFAULT '{}'
);
CREATE INDEX girders_by_area ON girders(area_id, position);

CREATE TABLE posts (
    id        TEXT PRIMARY KEY,
    girder_id TEXT NOT NULL REFERENCES girders(id) ON DELETE CASCADE,
    position  INTEGER NOT NULL,
    label     TEXT NOT NULL,
    data      TEXT NOT NULL DEFAULT '{}'
);
CREATE INDEX posts_by_girder ON posts(girder_id, position);

ALTER TABLE areas ADD COLUMN conditions TEXT NOT NULL DEFAULT '{}';
ALTER TABLE runs ADD COLUMN bears_on TEXT NOT NULL DEFAULT '[]';
