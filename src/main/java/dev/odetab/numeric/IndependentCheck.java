package dev.odetab.numeric;

import ch.obermuhlner.math.big.BigDecimalMath;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * {@link BallFunctions} against big-math 2.3.2 ({@code ch.obermuhlner.math.big.BigDecimalMath}),
 * an arbitrary-precision implementation written independently of ours: the project's one
 * adapter to big-math, used by {@code odetab check} and by tests.
 *
 * <p>Trust level: Heuristic. big-math states its results to be accurate to about one unit
 * in the last digit of the requested {@link MathContext}, an empirical tolerance, not a
 * proof. So a disagreement is reported as a failed check (one implementation is wrong), and
 * agreement proves nothing: our enclosures rest on their own written-out tail bounds. No
 * value computed here ever sets a radius or reaches a table.
 */
public final class IndependentCheck {
    /** big-math's result is asked for with this many digits beyond the ball's own. */
    private static final int EXTRA_DIGITS = 10;
    /** Units in big-math's last digit granted to its value (it claims about one). */
    private static final int TOLERANCE_UNITS = 10;

    private IndependentCheck() {
    }

    /** The functions compared: each has a ball version in {@link BallFunctions} and one in big-math. */
    public enum Function {
        /** π (no argument). */
        PI,
        /** e = exp(1) (no argument). */
        E,
        /** exp x. */
        EXP,
        /** ln x, x &gt; 0. */
        LOG,
        /** √x, x &gt;= 0. */
        SQRT,
        /** ∛x, x &gt;= 0. */
        CBRT,
        /** Γ(x), x not a pole. */
        GAMMA
    }

    /**
     * One comparison.
     *
     * @param function the function
     * @param x its argument (ignored by PI and E)
     * @param ours our enclosure at the requested precision
     * @param theirs big-math's value with {@link #EXTRA_DIGITS} more digits than the ball's midpoint
     * @param units |theirs − mid(ours)| − rad(ours), in units of big-math's last digit (at most 0 when the ball contains it)
     */
    public record Outcome(Function function, Rational x, Ball ours, BigDecimal theirs, double units) {
        /** Heuristic: the two agree within {@link #TOLERANCE_UNITS} units of big-math's last digit. */
        public boolean agrees() {
            return units <= TOLERANCE_UNITS;
        }

        /** The function and its argument as text, like {@code gamma(1/3)}. */
        public String label() {
            String name = function.name().toLowerCase(java.util.Locale.ROOT);
            return function == Function.PI || function == Function.E ? name : name + "(" + x.toDecimalOrFraction() + ")";
        }
    }

    /**
     * Heuristic: ours and big-math's {@code function} at the exact point {@code x}, ours at
     * {@code precBits} bits (a rigorous ball), big-math's with the ball's digits plus
     * {@link #EXTRA_DIGITS}.
     *
     * @throws ArithmeticException when x lies outside the function's domain (either library)
     */
    public static Outcome compare(Function function, Rational x, int precBits) {
        int digits = Precision.digits10(precBits) + EXTRA_DIGITS;
        MathContext mc = new MathContext(digits);
        int wp = precBits + 40;
        BigDecimal arg = x.toBigDecimal(new MathContext(digits + 10));
        Ball ball = Ball.of(x, wp);
        Ball ours = switch (function) {
            case PI -> BallFunctions.pi(precBits);
            case E -> BallFunctions.exp(Ball.ONE, precBits);
            case EXP -> BallFunctions.exp(ball, precBits);
            case LOG -> BallFunctions.log(ball, precBits);
            case SQRT -> BallFunctions.sqrt(ball, precBits);
            case CBRT -> BallFunctions.root(ball, 3, precBits);
            case GAMMA -> BallFunctions.gamma(ball, precBits);
        };
        BigDecimal theirs = switch (function) {
            case PI -> BigDecimalMath.pi(mc);
            case E -> BigDecimalMath.e(mc);
            case EXP -> BigDecimalMath.exp(arg, mc);
            case LOG -> BigDecimalMath.log(arg, mc);
            case SQRT -> BigDecimalMath.sqrt(arg, mc);
            case CBRT -> BigDecimalMath.root(arg, BigDecimal.valueOf(3), mc);
            case GAMMA -> BigDecimalMath.gamma(arg, mc);
        };
        BigDecimal beyond = theirs.subtract(ours.mid()).abs().subtract(ours.rad());
        BigDecimal unit = theirs.signum() == 0 ? BigDecimal.ONE.movePointLeft(digits) : theirs.ulp();
        return new Outcome(function, x, ours, theirs, beyond.divide(unit, MathContext.DECIMAL64).doubleValue());
    }

    /**
     * Heuristic: the fixed set of comparisons that {@code odetab check} reports: π, e, and exp,
     * log, √, ∛ and Γ at a few rational points of different sizes, at {@code precBits}.
     */
    public static List<Outcome> standard(int precBits) {
        List<Outcome> out = new ArrayList<>();
        out.add(compare(Function.PI, Rational.ZERO, precBits));
        out.add(compare(Function.E, Rational.ZERO, precBits));
        String[][] points = {
            {"EXP", "-7/2", "1/3", "25"},
            {"LOG", "1/1000", "2", "10/3", "1000000"},
            {"SQRT", "2", "1/3", "12345/7"},
            {"CBRT", "2", "3/4", "1000001"},
            {"GAMMA", "1/3", "2/3", "-5/2", "21/2"},
        };
        for (String[] row : points) {
            for (int i = 1; i < row.length; i++) {
                out.add(compare(Function.valueOf(row[0]), Rational.parse(row[i]), precBits));
            }
        }
        return out;
    }
}
