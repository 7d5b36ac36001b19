/**
 * Guided troubleshooting sessions: a job on one valve as an append-only list of events (symptoms,
 * readings, check results, trace references, notes, retractions, closing and reopening), the
 * diagnosis recomputed from them after every addition, closure records for maintenance systems,
 * and history per valve and per fault. Retried POSTs carrying the same Idempotency-Key are answered
 * from what was stored the first time, never stored twice.
 */
package dev.positioner.session;
