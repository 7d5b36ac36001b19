package dev.positioner.trace;

/** Outcome of Horch's cross-correlation test. */
public enum StictionVerdict {
    /** Cross-correlation odd: the oscillation looks like stick-slip of the valve. */
    STICTION_LIKELY,
    /** Cross-correlation even: the oscillation has another cause (tuning, a disturbance). */
    NOT_STICTION,
    /** No oscillation, too little data, or a correlation neither clearly odd nor even. */
    CANNOT_TELL
}
