/**
 * Spec files (TOML) and the command line's FUNCTION arguments: reading, validation, and
 * errors located as {@code file:line:column}.
 *
 * <p>Invariant: bad input becomes an {@link InputError} with its position,
 * never an unchecked exception.
 */
package dev.odetab.spec;

import dev.odetab.base.InputError;
