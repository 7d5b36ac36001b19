package dev.positioner.diagnosis.facts;

/**
 * A piece of evidence ({@code "symptom:slow_stroke"} or {@code "check:read_drain_pressure"}) that a
 * condition already present accounts for, whatever the fault is. Explained evidence is neutral: it
 * neither supports nor counts against any cause.
 */
public record Explained(String evidence, String reason) {

    public static Explained symptom(String code, String reason) {
        return new Explained("symptom:" + code, reason);
    }

    public static Explained check(String code, String reason) {
        return new Explained("check:" + code, reason);
    }
}
