package dev.positioner.trace;

import java.time.Instant;

/** An uploaded trace as kept: its analysis and its picture; the raw samples are not kept. */
public record TraceRecord(String id, Instant uploaded, String name, TraceAnalysis analysis, String svg) {
}
