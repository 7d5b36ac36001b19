/**
 * What every endpoint shares: RFC 9457 problem details for bad input (never a 500 for a client's
 * mistake), and the contract in {@code openapi/} served unchanged.
 */
package dev.positioner.api;
