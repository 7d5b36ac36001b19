/**
 * Quantities and units as clients send them (psi, bar, degF, gpm ...) and their conversion to the
 * canonical units the calculations and rules work in. Conversion goes through the JSR 385 reference
 * implementation (Indriya) so that no conversion factor is typed in by hand, except the few signal
 * ranges (4-20 mA, 3-15 psi, 0.2-1.0 bar) that are definitions rather than unit conversions.
 */
package dev.positioner.measure;
