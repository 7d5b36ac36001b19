package dev.positioner.diagnosis.facts;

/** A symptom said to be present or absent; {@code origin} is "client" or the ID of the rule that derived it. */
public record ReportedSymptom(String code, boolean present, String origin) {
}
