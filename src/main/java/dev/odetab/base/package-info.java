/**
 * The lowest layer: types that every other package may use and that depend on nothing of
 * odetab's own: the two kinds of user-facing error ({@link dev.odetab.base.InputError},
 * {@link dev.odetab.base.ExprException}), the progress callback and a minimal JSON writer.
 * Invariant: nothing here computes a number that reaches an output.
 */
package dev.odetab.base;
