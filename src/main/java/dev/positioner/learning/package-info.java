/**
 * Learning from confirmed closures: the catalogue priors are treated as a Dirichlet prior worth a
 * fixed number of closures, and the confirmed causes on this valve and on the other valves of its
 * site are added as counts. A handful of closures moves the priors, it does not replace them.
 */
package dev.positioner.learning;
