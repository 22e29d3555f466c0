package dev.odetab.expr;

/**
 * The coefficients of P2 y'' + P1 y' + P0 y = 0 as written (denominators cleared, nothing else
 * divided out). The {@code ode} package turns it into an equation; {@code expr} stays below it.
 */
public record ParsedEquation(Poly p2, Poly p1, Poly p0) {
}
