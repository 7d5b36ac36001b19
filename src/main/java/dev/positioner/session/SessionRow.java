package dev.positioner.session;

import java.time.Instant;

/** The session's own row: who opened which job on which valve, and where its event list stands. */
record SessionRow(String id, String tag, String workOrder, String openedBy, Instant openedAt, String status,
        int lastSeq, String openHash, int openSeq) {

    static final String OPEN = "open";
    static final String CLOSED = "closed";

    boolean closed() {
        return CLOSED.equals(status);
    }
}
