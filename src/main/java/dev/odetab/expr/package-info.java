/**
 * Exact constant expressions, exact polynomials and rational functions in x, and the
 * parsers that read them and second-order linear equations from ordinary notation.
 *
 * <p>Invariant: nothing here is ever rounded except by {@link dev.odetab.expr.ConstExpr#evaluate(int)},
 * whose every returned Ball contains the exact value; every parse error is an
 * {@link dev.odetab.expr.ExprException} carrying the exact 1-based column in the given text.
 */
package dev.odetab.expr;

import dev.odetab.base.ExprException;
