package dev.positioner.diagnosis.facts;

/**
 * The outcome of a check of the catalogue. {@code origin} is "technician" for a check the client
 * reports, or the ID of the rule that read the outcome off a measurement.
 */
public record Observation(String check, String outcome, String origin) {

    public static final String TECHNICIAN = "technician";

    public boolean byTechnician() {
        return TECHNICIAN.equals(origin);
    }
}
