/**
 * Learning from confirmed closures. Priors: the catalogue priors are treated as a Dirichlet prior
 * worth a fixed number of closures, and the confirmed causes on this valve and on the other valves
 * of its site are added as counts. Symptom likelihoods: each catalogue value is a Beta prior worth a
 * fixed number of jobs, and the symptoms the site's closed jobs reported present or absent are added
 * for their confirmed cause. A handful of closures moves the numbers, it does not replace them.
 */
package dev.positioner.learning;
