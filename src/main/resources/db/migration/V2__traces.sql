-- Analysed position traces, kept so sessions and diagnoses can refer to them by id after a
-- restart and from any instance. The raw samples are not kept: only the analysis (JSON) and the
-- picture (SVG), each well under the 1,000,000-character limit (the picture is decimated to at
-- most 2000 points per line).
CREATE TABLE trace (
    id        VARCHAR(36)      NOT NULL PRIMARY KEY,
    uploaded  TIMESTAMP WITH TIME ZONE NOT NULL,
    name      VARCHAR(200),
    analysis  VARCHAR(1000000) NOT NULL,
    svg       VARCHAR(1000000) NOT NULL
);
