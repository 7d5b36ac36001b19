-- Portable SQL: the same file runs on H2 2.x and PostgreSQL 13+. Text columns are VARCHAR with
-- generous limits rather than CLOB/TEXT, whose handling differs between the two.

-- The valve registry. Design data is kept as recorded ({quantity, value, unit} JSON array) so the
-- registry shows what the engineer typed; conversion to SI happens on every diagnosis.
CREATE TABLE asset (
    tag                VARCHAR(64)   NOT NULL PRIMARY KEY,
    description        VARCHAR(500),
    area               VARCHAR(200),
    site               VARCHAR(100),
    oil_grade          VARCHAR(16),
    cleanliness_target VARCHAR(16),
    design             VARCHAR(8000) NOT NULL,
    created_at         TIMESTAMP WITH TIME ZONE NOT NULL,
    updated_at         TIMESTAMP WITH TIME ZONE NOT NULL
);
CREATE INDEX asset_area ON asset (area);
CREATE INDEX asset_site ON asset (site);

-- One troubleshooting job on one valve. last_seq is the sequence number of its newest event; the
-- row is locked while an event is appended, which orders appends from several instances. open_key
-- and open_hash make a retried open return the first answer; open_seq is the last event it wrote.
CREATE TABLE work_session (
    id          VARCHAR(36)  NOT NULL PRIMARY KEY,
    tag         VARCHAR(64)  NOT NULL REFERENCES asset (tag),
    work_order  VARCHAR(100),
    opened_by   VARCHAR(100) NOT NULL,
    opened_at   TIMESTAMP WITH TIME ZONE NOT NULL,
    status      VARCHAR(10)  NOT NULL,
    last_seq    INTEGER      NOT NULL,
    open_key    VARCHAR(200) UNIQUE,
    open_hash   VARCHAR(64),
    open_seq    INTEGER      NOT NULL
);
CREATE INDEX work_session_tag ON work_session (tag, opened_at);

-- Append-only: rows are inserted, never updated or deleted. An undo is a retraction event.
CREATE TABLE session_event (
    session_id      VARCHAR(36)  NOT NULL REFERENCES work_session (id),
    seq             INTEGER      NOT NULL,
    type            VARCHAR(20)  NOT NULL,
    author          VARCHAR(100) NOT NULL,
    recorded_at     TIMESTAMP WITH TIME ZONE NOT NULL,
    body            VARCHAR(4000) NOT NULL,
    idempotency_key VARCHAR(200),
    request_hash    VARCHAR(64),
    PRIMARY KEY (session_id, seq),
    CONSTRAINT session_event_key UNIQUE (session_id, idempotency_key)
);

-- The record a maintenance system takes away. reopened_at is set when the job is reopened; such a
-- closure stays as history but no longer counts for learning.
CREATE TABLE closure (
    session_id     VARCHAR(36)  NOT NULL REFERENCES work_session (id),
    seq            INTEGER      NOT NULL,
    tag            VARCHAR(64)  NOT NULL,
    site           VARCHAR(100),
    work_order     VARCHAR(100),
    fault          VARCHAR(64)  NOT NULL,
    failure_mode   VARCHAR(10),
    mechanism      VARCHAR(100),
    cause          VARCHAR(500),
    action         VARCHAR(2000) NOT NULL,
    parts          VARCHAR(2000) NOT NULL,
    minutes        DOUBLE PRECISION NOT NULL,
    remarks        VARCHAR(2000),
    closed_by      VARCHAR(100) NOT NULL,
    closed_at      TIMESTAMP WITH TIME ZONE NOT NULL,
    reopened_at    TIMESTAMP WITH TIME ZONE,
    PRIMARY KEY (session_id, seq)
);
CREATE INDEX closure_tag ON closure (tag, fault);
CREATE INDEX closure_fault ON closure (fault);
CREATE INDEX closure_site ON closure (site, fault);
