/**
 * The technician's tablet page (static files under {@code META-INF/resources}) and the one
 * read-only endpoint it needs beyond the diagnosis contract: the words to show for each code.
 * The page talks to the same public API as any other client, so nothing here decides anything.
 */
package dev.positioner.web;
