/**
 * The facts the rules in {@code rules/} reason over. Java inserts what the client said
 * ({@link dev.positioner.diagnosis.facts.ReportedSymptom}, {@link dev.positioner.diagnosis.facts.Reading},
 * {@link dev.positioner.diagnosis.facts.Observation} from the technician) and what the design data
 * imply ({@link dev.positioner.diagnosis.facts.Band}, {@link dev.positioner.diagnosis.facts.Design});
 * rules derive the rest. All values are in canonical units (Pa, degC, percent, s, m, m/s, m3/s).
 */
package dev.positioner.diagnosis.facts;
