-- Office schema version 1: the firm's people and their tokens, content-addressed files,
-- inspections with every revision pushed (none overwritten), the findings of each revision
-- for search, delivered reports, and the firm's settings.

CREATE TABLE people (
    id          BIGSERIAL PRIMARY KEY,
    name        TEXT NOT NULL UNIQUE,
    role        TEXT NOT NULL CHECK (role IN ('inspector', 'office')),
    created_at  TIMESTAMPTZ NOT NULL DEFAULT now()
);

-- A token is shown once when issued; only its Argon2id hash is kept.
CREATE TABLE tokens (
    id           TEXT PRIMARY KEY,
    person_id    BIGINT NOT NULL REFERENCES people(id),
    secret_hash  TEXT NOT NULL,
    created_at   TIMESTAMPTZ NOT NULL DEFAULT now(),
    revoked_at   TIMESTAMPTZ
);

-- A file is kept once, named by the SHA-256 of its bytes (checked when it arrived); its
-- bytes are in the server's file folder under that name.
CREATE TABLE blobs (
    sha256     TEXT PRIMARY KEY CHECK (sha256 ~ '^[0-9a-f]{64}$'),
    kind       TEXT NOT NULL CHECK (kind IN ('image', 'pdf')),
    bytes      BIGINT NOT NULL CHECK (bytes > 0),
    stored_at  TIMESTAMPTZ NOT NULL DEFAULT now()
);

CREATE TABLE inspections (
    id               TEXT PRIMARY KEY,
    owner_id         BIGINT NOT NULL REFERENCES people(id),
    latest_revision  BIGINT,
    first_pushed_at  TIMESTAMPTZ NOT NULL DEFAULT now()
);

CREATE TABLE revisions (
    id              BIGSERIAL PRIMARY KEY,
    inspection_id   TEXT NOT NULL REFERENCES inspections(id),
    content_sha256  TEXT NOT NULL,
    based_on        TEXT,
    device          TEXT NOT NULL,
    pushed_by       BIGINT NOT NULL REFERENCES people(id),
    pushed_at       TIMESTAMPTZ NOT NULL DEFAULT now(),
    -- The newer revision from another device this one was pushed beside, if any.
    conflict_with   BIGINT REFERENCES revisions(id),
    address         TEXT NOT NULL,
    client          TEXT NOT NULL,
    inspected_on    DATE,
    inspector_name  TEXT NOT NULL,
    code_edition    TEXT NOT NULL,
    manifest        JSONB NOT NULL,
    UNIQUE (inspection_id, content_sha256)
);
ALTER TABLE inspections
    ADD CONSTRAINT inspections_latest_fk FOREIGN KEY (latest_revision) REFERENCES revisions(id);
CREATE INDEX revisions_of_inspection ON revisions (inspection_id, id);

-- Every file a revision names: a revision is stored only when all of them are.
CREATE TABLE revision_files (
    revision_id  BIGINT NOT NULL REFERENCES revisions(id),
    sha256       TEXT NOT NULL REFERENCES blobs(sha256),
    PRIMARY KEY (revision_id, sha256)
);

CREATE TABLE findings (
    revision_id  BIGINT NOT NULL REFERENCES revisions(id),
    position     INT NOT NULL,
    -- over-limit, to-evaluate, near-limit, incomplete, within, not-checked
    status       TEXT NOT NULL,
    status_label TEXT NOT NULL,
    basis        TEXT NOT NULL,
    title        TEXT NOT NULL,
    place        TEXT NOT NULL,
    summary      TEXT NOT NULL,
    citation     TEXT NOT NULL,
    search       TSVECTOR GENERATED ALWAYS AS
                   (to_tsvector('english', title || ' ' || place || ' ' || summary)) STORED,
    PRIMARY KEY (revision_id, position)
);
CREATE INDEX findings_search ON findings USING GIN (search);

-- A delivered report, recorded once by the device's id of the delivery.
CREATE TABLE deliveries (
    inspection_id   TEXT NOT NULL REFERENCES inspections(id),
    report_id       TEXT NOT NULL,
    delivered_at    TIMESTAMPTZ NOT NULL,
    file_name       TEXT NOT NULL,
    recipient       TEXT NOT NULL,
    sha256          TEXT NOT NULL,
    bytes           BIGINT NOT NULL,
    -- Null when the device no longer held the PDF.
    pdf             TEXT REFERENCES blobs(sha256),
    first_revision  BIGINT NOT NULL REFERENCES revisions(id),
    PRIMARY KEY (inspection_id, report_id)
);

CREATE TABLE firm_settings (
    id          INT PRIMARY KEY CHECK (id = 1),
    body        JSONB NOT NULL,
    updated_at  TIMESTAMPTZ NOT NULL DEFAULT now(),
    updated_by  BIGINT REFERENCES people(id)
);
