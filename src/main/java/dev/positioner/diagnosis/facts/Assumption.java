package dev.positioner.diagnosis.facts;

/** Something the service assumed because it was not given, said back to the client. */
public record Assumption(String text) {
}
