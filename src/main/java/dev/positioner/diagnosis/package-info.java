/**
 * The one-shot diagnosis: validate and convert a request into facts, let the rules interpret them,
 * rank the fault hypotheses (single-fault Bayes with an explicit unlisted cause) and choose the next
 * check by expected cost of repair with one-step look-ahead.
 */
package dev.positioner.diagnosis;
