/**
 * The database behind sessions, the valve registry and closures: which datasource is active (embedded
 * H2 by default, PostgreSQL when the {@code pg} profile is on) and short explicit JDBC transactions.
 * Every instance keeps no state of its own beyond this database, so several can share one PostgreSQL.
 */
package dev.positioner.storage;
