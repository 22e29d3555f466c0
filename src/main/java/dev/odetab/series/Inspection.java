package dev.odetab.series;

import dev.odetab.base.ExprException;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.DecimalDigits;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What {@code odetab inspect} shows of a function's series: whether the solution is an exact
 * polynomial, the coefficient recurrence at a point (docs/methods.md §1) and the first Taylor
 * coefficients there.
 * Computed here, so that the command line only prints.
 *
 * <p>Trust level: Rigorous. The polynomial is exact; each coefficient's ball contains the exact
 * Taylor coefficient, and its rounded value is present only when every point of the ball
 * rounds to it.
 */
public final class Inspection {
    private Inspection() {
    }

    /**
     * A solution whose series terminates.
     *
     * @param polynomial the solution as an exact polynomial
     * @param order J, the order of the recurrence at the normalization point: the number of
     *     consecutive zero coefficients that end the series
     */
    public record Terminating(Poly polynomial, int order) {
    }

    /** Exact: the solution {@code f} as a polynomial, when its series terminates ({@link ExactPolynomial}). */
    public static Optional<Terminating> terminating(FunctionDef f) throws ExprException {
        Optional<Poly> poly = FunctionEvaluator.polynomial(f);
        return poly.map(p -> new Terminating(p, new Recurrence(f.equation(), f.at()).order()));
    }

    /**
     * One Taylor coefficient.
     *
     * @param enclosure a ball containing it
     * @param rounded the coefficient correctly rounded (half-even) to the digits asked for,
     *     when the enclosure decides it
     */
    public record Coefficient(Ball enclosure, Optional<BigDecimal> rounded) {
    }

    /** Exact: the coefficient recurrence of {@code equation} at {@code x}, as {@link Recurrence#describe()} writes it. */
    public static String recurrence(Equation equation, Rational x) {
        return new Recurrence(equation, x).describe();
    }

    /**
     * Rigorous: the first {@code count} Taylor coefficients c(0), c(1), … of {@code f} at the
     * ordinary point {@code x}, enclosed at {@code precBits} and rounded to {@code digits10}
     * digits where the enclosure decides them.
     *
     * @throws dev.odetab.ode.SingularCrossingException (unchecked, from the walk) when the path from the
     *     normalization point to x meets a singular point
     */
    public static List<Coefficient> coefficients(FunctionDef f, Rational x, int count, int digits10, int precBits)
            throws ExprException {
        Recurrence rec = new Recurrence(f.equation(), x);
        Jet jet = FunctionEvaluator.enclose(f, x, precBits).jet();
        List<Coefficient> c = new ArrayList<>();
        for (Ball b : LocalSeries.coefficients(rec, jet.value(), jet.derivative(), count, precBits)) {
            c.add(new Coefficient(b, DecimalDigits.round(b, digits10)));
        }
        return c;
    }
}
