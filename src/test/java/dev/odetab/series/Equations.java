package dev.odetab.series;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;

/** The equations the series tests share, written out as P2 y'' + P1 y' + P0 y = 0. */
final class Equations {
    /** Airy's equation y'' − x y = 0 (DLMF 9.2.1). */
    static final Equation AIRY = new Equation(Poly.ONE, Poly.ZERO, Poly.X.negate());
    /** y'' − y = 0: with y(0) = y'(0) = 1 the solution is e^x. */
    static final Equation EXP = new Equation(Poly.ONE, Poly.ZERO, Poly.ONE.negate());

    private Equations() {
    }

    /** Legendre's equation (1 − x²) y'' − 2x y' + n(n+1) y = 0, DLMF 14.2.1 with μ = 0; singular at ±1. */
    static Equation legendre(int n) {
        return new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)), Poly.of(Rational.ZERO, Rational.of(-2)),
                Poly.constant(Rational.of((long) n * (n + 1))));
    }
}
