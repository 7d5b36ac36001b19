/** Valve tags and their design data, so that a request can name a tag instead of carrying the data. */
package dev.positioner.asset;
