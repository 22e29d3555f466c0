package dev.odetab.series;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.DecimalDigits;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Rounding;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Precision;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.SingularCrossingException;
import dev.odetab.expr.Poly;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Values of a {@link FunctionDef} at exact points, as enclosures or correctly rounded decimals.
 *
 * <p>Trust level: Rigorous. The normalization becomes balls at its point ({@link Start}), then
 * is continued from there to x along the real line ({@link Continuation}); every returned ball
 * contains the exact value.
 * {@link #digits} adds Ziv's precision loop ({@link PrecisionLoop}): a decimal is returned only
 * when every point of the enclosure rounds to it. Before the loop, a walk whose estimated cost
 * ({@link WalkCost#check}) exceeds the cap or the walk limit is refused.
 */
public final class FunctionEvaluator {
    /** Degree bound for the search for polynomial solutions. */
    private static final int MAX_POLYNOMIAL_DEGREE = 4096;
    private static final Map<FunctionDef, Optional<Poly>> POLYNOMIALS = new ConcurrentHashMap<>();

    private FunctionEvaluator() {
    }

    /**
     * The function as an exact polynomial in x, when its normalization constants are exact
     * rationals and its series terminates ({@link ExactPolynomial}); empty otherwise.
     */
    public static Optional<Poly> polynomial(FunctionDef f) {
        return POLYNOMIALS.computeIfAbsent(f, def -> {
            Optional<Rational> y0 = def.value().exact();
            Optional<Rational> y1 = def.slope().exact();
            if (y0.isEmpty() || y1.isEmpty()) {
                return Optional.empty();
            }
            return ExactPolynomial.detect(def.equation(), def.at(), y0.get(), y1.get(), MAX_POLYNOMIAL_DEGREE);
        });
    }

    /**
     * Exact y(x) (or y'(x)) when the function is a polynomial ({@link #polynomial}); empty
     * otherwise. Trust level: Exact.
     */
    public static Optional<Rational> exact(FunctionDef f, Rational x, boolean derivative) {
        return polynomial(f).map(p -> (derivative ? p.derivative() : p).evaluate(x));
    }

    /** An enclosure and the work that produced it. */
    public record Enclosure(Jet jet, int precBits, int steps, int terms) {
    }

    /**
     * A correctly rounded decimal and the work it took (the last, deciding, evaluation);
     * {@code exact} when it came from the exact polynomial path (no enclosure was needed).
     */
    public record Rounded(BigDecimal value, Ball enclosure, int precBits, int attempts, int steps, int terms, boolean exact) {
    }

    /**
     * Balls containing y(x) and y'(x) at working precision {@code precBits}.
     *
     * @throws ExprException when a normalization constant cannot be evaluated
     * @throws SingularCrossingException when a real singular point lies between the normalization point and x
     */
    public static Enclosure enclose(FunctionDef f, Rational x, int precBits) throws ExprException {
        Optional<Poly> poly = polynomial(f);
        if (poly.isPresent()) {
            Jet exact = new Jet(Ball.of(poly.get().evaluate(x), precBits), Ball.of(poly.get().derivative().evaluate(x), precBits));
            return new Enclosure(exact, precBits, 0, 0);
        }
        Continuation.Result r = Continuation.evaluate(Start.of(f), x, precBits);
        return new Enclosure(r.jet(), precBits, r.steps(), r.terms());
    }

    /** A correctly rounded table entry and the work it took. */
    public record Decided(Entry entry, int precBits, int attempts, int steps, int terms, boolean exact) {
    }

    /**
     * y(x), or y'(x) when {@code derivative}, correctly rounded to {@code target} (Ziv's loop;
     * exact polynomials are rounded from their exact value).
     *
     * @throws PrecisionCapException when {@code capBits} is not enough to decide the rounding, or the
     *     walk's estimated cost exceeds it or the walk limit ({@link WalkCost#check})
     */
    public static Decided entry(FunctionDef f, Rational x, boolean derivative, Target target, int capBits)
            throws ExprException, PrecisionCapException {
        Optional<Rational> exact = exact(f, x, derivative);
        if (exact.isPresent()) {
            return new Decided(Rounding.round(exact.get(), target), 0, 0, 0, 0, true);
        }
        int needed = target.format().significantBits();
        WalkCost.check(Start.of(f), List.of(x), needed, capBits);
        Enclosure[] last = new Enclosure[1];
        PrecisionLoop.Outcome<Entry> out = PrecisionLoop.<Entry, ExprException>run(prec -> {
            last[0] = enclose(f, x, prec);
            return derivative ? last[0].jet().derivative() : last[0].jet().value();
        }, b -> Rounding.decide(b, target), needed, PrecisionLoop.chooseStartBits(target.format()), capBits);
        return new Decided(out.result(), out.precBits(), out.attempts(), last[0].steps(), last[0].terms(), false);
    }

    /**
     * y(x), or y'(x) when {@code derivative}, correctly rounded to {@code digits10} significant
     * digits (round half to even).
     *
     * @throws PrecisionCapException when {@code capBits} is not enough to decide the rounding, or the
     *     walk's estimated cost exceeds it or the walk limit ({@link WalkCost#check})
     */
    public static Rounded digits(FunctionDef f, Rational x, boolean derivative, int digits10, int capBits)
            throws ExprException, PrecisionCapException {
        Optional<Rational> exact = exact(f, x, derivative);
        if (exact.isPresent()) {
            BigDecimal v = exact.get().toBigDecimal(new MathContext(digits10, java.math.RoundingMode.HALF_EVEN));
            return new Rounded(v, Ball.of(exact.get(), Precision.bitsForDigits(digits10)), 0, 0, 0, 0, true);
        }
        int needed = Precision.bitsForDigits(digits10);
        WalkCost.check(Start.of(f), List.of(x), needed, capBits);
        Enclosure[] last = new Enclosure[1];
        PrecisionLoop.Outcome<BigDecimal> out = PrecisionLoop.<BigDecimal, ExprException>run(prec -> {
            last[0] = enclose(f, x, prec);
            return derivative ? last[0].jet().derivative() : last[0].jet().value();
        }, b -> DecimalDigits.round(b, digits10), needed, needed + 32, capBits);
        return new Rounded(out.result(), out.enclosure(), out.precBits(), out.attempts(), last[0].steps(), last[0].terms(), false);
    }
}
