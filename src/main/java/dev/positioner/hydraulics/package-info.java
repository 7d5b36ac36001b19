/**
 * Hydraulic calculations that turn a technician's readings and a valve's design data into
 * numbers that can be compared with what the valve should show: oil viscosity and density at
 * temperature, drain-line pressure drop, piston thrust and expected stroke time, ISO 4406
 * cleanliness codes, effective bulk modulus and hydraulic natural frequency, internal leakage
 * from creep and the supply pressure band. (Signal ranges and percent of span are in
 * {@code dev.positioner.measure.UnitConverter}; the deviation limit is a rule, INT-SIG-01.)
 *
 * <p>Every class here is pure: static methods, no state, no I/O, no framework. Inputs and
 * outputs are SI doubles (Pa, m, m&sup2;, m&sup3;/s, s, K, N, kg, kg/m&sup3;), with two
 * deliberate exceptions named in the method names: temperatures in degrees Celsius where the
 * name says {@code Celsius}, and kinematic viscosity in mm&sup2;/s (cSt), because every oil
 * data sheet and standard quotes it that way. Unit conversion and validation of client input
 * belong upstream; these methods reject only values that make the formula meaningless.
 *
 * <p>Each class names its source in its javadoc: a standard, a textbook, or plainly "common
 * practice" where no published basis was found. The tests check the numbers against those
 * sources.
 */
package dev.positioner.hydraulics;
