package dev.positioner.diagnosis.facts;

import java.util.List;

/**
 * Which way this valve moves with its signal and where it goes when supply or signal is lost, from
 * its design data. The motion rules judge "runaway", "wrong direction" and "against a stop" against
 * it: a valve whose increasing signal closes it sits fully open at zero signal and is healthy there.
 * {@code stated} is false when the design data said nothing and the usual direct action is assumed.
 */
public record ValveAction(boolean increaseOpens, String failPosition, Boolean returnSpring, boolean stated) {

    public static final String INCREASE_OPENS = "increase_opens";
    public static final String INCREASE_CLOSES = "increase_closes";
    public static final List<String> ACTIONS = List.of(INCREASE_OPENS, INCREASE_CLOSES);
    public static final List<String> FAIL_POSITIONS = List.of("open", "closed", "in_place");

    public static ValveAction of(String action, String failPosition, Boolean returnSpring) {
        return new ValveAction(!INCREASE_CLOSES.equals(action), failPosition, returnSpring, action != null);
    }

    /** Stem position (percent open) this valve should settle at for a signal (percent of range). */
    public double expectedStem(double signalPercent) {
        return increaseOpens ? signalPercent : 100 - signalPercent;
    }

    /** The stem position of its fail position, or NaN when it stays in place or is not known. */
    public double failStem() {
        return "open".equals(failPosition) ? 100 : "closed".equals(failPosition) ? 0 : Double.NaN;
    }

    /** Whether a stem position is at the end this valve goes to on loss of supply (within 2 % of travel). */
    public boolean atFailEnd(double stem) {
        double end = failStem();
        return !Double.isNaN(end) && Math.abs(stem - end) <= 2.0;
    }

    public String actionCode() {
        return increaseOpens ? INCREASE_OPENS : INCREASE_CLOSES;
    }
}
