package dev.odetab.series;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;

/**
 * Where a walk begins: a normalization turned into balls of y and y' at an exact ordinary point,
 * from which {@link Continuation} carries the solution anywhere along the real line.
 *
 * <p>Trust level: Rigorous. {@link #jet} returns balls containing the exact y and y' of the
 * named solution at {@link #point}, which is an ordinary point of the equation.
 *
 * <p>One kind exists today, {@link OrdinaryStart}: the normalization is given at an ordinary
 * point (y(a), y'(a) as exact constant expressions). A start at a regular singular point s
 * (docs/methods.md §8, Frobenius series) will be a second implementation, {@code FrobeniusStart}: the
 * normalization fixes the coefficients of the Frobenius solution x^λ Σ c_k (x − s)^k (and its
 * logarithmic companion), whose tail is bounded as in docs/methods.md §8; its {@link #point} is an exact
 * ordinary point s + h inside the Frobenius series' radius (h a power of two below a fraction of
 * the distance to the nearest other singular point), and its {@link #jet} is the sum of that
 * series and its derivative at s + h, as balls. The walker then never sees s: it starts at
 * s + h and refuses, as for every start, any path through a singular point. Exact polynomial
 * solutions never get here: they keep their exact path ({@link FunctionEvaluator#polynomial}).
 */
public sealed interface Start permits OrdinaryStart {
    /** The start of the function's own normalization. */
    static Start of(FunctionDef f) {
        return new OrdinaryStart(f);
    }

    /** The equation whose solution starts here (not reduced). */
    Equation equation();

    /** The exact ordinary point where the state is given. */
    Rational point();

    /**
     * Rigorous: balls containing y and y' at {@link #point}, accurate to about {@code precBits}
     * bits (more where the constants are exact).
     *
     * @throws ExprException when a normalization constant cannot be evaluated
     */
    Jet jet(int precBits) throws ExprException;
}
