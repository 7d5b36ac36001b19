package dev.positioner.hydraulics;

/** Argument guards shared by the calculations; a NaN or a negative bore must never reach a formula. */
final class Checks {

    private Checks() {
    }

    static double positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be a positive finite number, was " + value);
        }
        return value;
    }

    static double nonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be zero or a positive finite number, was " + value);
        }
        return value;
    }

    static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number, was " + value);
        }
        return value;
    }
}
