/**
 * The knowledge base: catalogues of faults, symptoms, checks, cautions, sources and quantities
 * read from the top-level {@code rules/} folder, the DRL rules compiled beside them, and the
 * validation that refuses to run on a broken base. Everything a reliability engineer edits lives
 * in {@code rules/}; this package only reads, checks and reports on it.
 */
package dev.positioner.knowledge;
