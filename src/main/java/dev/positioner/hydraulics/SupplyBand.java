package dev.positioner.hydraulics;

/**
 * Supply pressure against its nominal value and a tolerance band.
 *
 * <p>The default band of &plusmn;10 % of nominal is common practice for judging a gauge reading
 * on a regulated hydraulic supply, not a figure from a standard; the valve maker's or site's
 * band should replace it when known. Readings on a limit count as normal.
 */
public final class SupplyBand {

    /** Default half-width of the band as a fraction of nominal (common practice). */
    public static final double DEFAULT_BAND = 0.10;

    public enum Status { LOW, NORMAL, HIGH }

    /** Limits in Pa; deviation = (measured &minus; nominal) / nominal. */
    public record Result(Status status, double measured, double nominal, double lowLimit, double highLimit,
                         double deviation) {
    }

    private SupplyBand() {
    }

    public static Result classify(double measured, double nominal) {
        return classify(measured, nominal, DEFAULT_BAND);
    }

    public static Result classify(double measured, double nominal, double band) {
        Checks.finite("measured pressure [Pa]", measured);
        Checks.positive("nominal pressure [Pa]", nominal);
        Checks.positive("band", band);
        if (band >= 1) {
            throw new IllegalArgumentException("band is a fraction of nominal and must be below 1, was " + band);
        }
        double low = nominal * (1 - band);
        double high = nominal * (1 + band);
        Status status = measured < low ? Status.LOW : measured > high ? Status.HIGH : Status.NORMAL;
        return new Result(status, measured, nominal, low, high, (measured - nominal) / nominal);
    }
}
