/**
 * The engineering calculations offered directly to a technician ({@code /api/v1/calculations/...}):
 * the same methods the diagnosis uses, with units in and out and the method and source named.
 */
package dev.positioner.calculation;
