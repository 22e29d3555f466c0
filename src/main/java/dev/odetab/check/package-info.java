/**
 * The {@code odetab check} command's work: recomputing the published values shipped in
 * {@code reference-data/} and the identities without outside digits. Invariant: a value passes
 * only when its published interval meets the engine's proven enclosure.
 */
package dev.odetab.check;
