package dev.positioner.diagnosis.facts;

/**
 * What an uploaded trace says about how the loop cycles: Horch's stiction verdict
 * (STICTION_LIKELY, NOT_STICTION or CANNOT_TELL) and whether hunting with a steady input was detected.
 */
public record TraceVerdict(String traceId, String stiction, boolean hunting) {
}
