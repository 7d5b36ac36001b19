/**
 * The valve registry: tags, where they are, and their design data, kept in the database and checked
 * with the same quantity definitions and unit conversion the diagnosis uses, so that a request can
 * name a tag instead of carrying the data. Bulk import from CSV reports every rejected row. The
 * invented demonstration plant is copied in at start-up when {@code positioner.demo-data} is on.
 */
package dev.positioner.asset;
