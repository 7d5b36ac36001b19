-- The symptoms a closed job had reported, present or absent, as the session stood at closing
-- (retracted reports left out): what learning symptom likelihoods counts. Closures written before
-- this table existed have no rows and teach nothing about symptoms.
CREATE TABLE closure_symptom (
    session_id VARCHAR(36) NOT NULL,
    seq        INTEGER     NOT NULL,
    symptom    VARCHAR(64) NOT NULL,
    present    BOOLEAN     NOT NULL,
    PRIMARY KEY (session_id, seq, symptom),
    FOREIGN KEY (session_id, seq) REFERENCES closure (session_id, seq)
);
