package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.cli.CliRunner;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apfloat.Apfloat;

/**
 * Checks shared by the family tests: binary64 entries against an apfloat reference rounded by
 * Java SE's correctly rounded decimal-to-double conversion, exact coefficients against
 * commons-math3, and parameter errors through the command line.
 */
final class FamilyChecks {
    /**
     * Working precision of the apfloat inputs, in decimal digits. apfloat's polynomial functions
     * of high degree lose digits to cancellation (and report it by a lower precision of the
     * result), so the inputs carry far more than the 50 digits the comparison needs.
     */
    static final long DIGITS10 = 150;

    /** Digits a reference must still have after apfloat's cancellation. */
    static final long REFERENCE_DIGITS10 = 50;

    private FamilyChecks() {
    }

    static Apfloat apfloat(Rational r) {
        return new Apfloat(new BigDecimal(r.numerator()), DIGITS10).divide(new Apfloat(new BigDecimal(r.denominator()), DIGITS10));
    }

    static Apfloat apfloat(long v) {
        return new Apfloat(v, DIGITS10);
    }

    /** {@code count} exact decimals from {@code from} in steps of {@code step}. */
    static List<Rational> points(String from, String step, int count) {
        List<Rational> xs = new ArrayList<>();
        Rational x = Rational.parse(from);
        for (int i = 0; i < count; i++) {
            xs.add(x);
            x = x.add(Rational.parse(step));
        }
        return xs;
    }

    /**
     * The binary64 entry of f at every point equals the reference value correctly rounded
     * (the reference is printed with its 60 digits and rounded by {@link BigDecimal#doubleValue}).
     */
    static void assertBinary64(FunctionDef f, List<Rational> xs, Function<Apfloat, Apfloat> reference, String what) throws Exception {
        for (Rational x : xs) {
            Apfloat ref = reference.apply(apfloat(x));
            assertTrue(ref.signum() == 0 || ref.precision() >= REFERENCE_DIGITS10,
                    what + " at x = " + x.toDecimalOrFraction() + ": apfloat kept only " + ref.precision() + " digits");
            // rounded to 50 digits first, so that an exact tie (a dyadic value, where apfloat may
            // print 0.4999…9 in its last places) reaches the correct rounding as the tie it is
            BigDecimal refDecimal = new BigDecimal(ref.toString(true)).round(new MathContext((int) REFERENCE_DIGITS10));
            long expected = Double.doubleToRawLongBits(refDecimal.doubleValue());
            BigInteger bits = FunctionEvaluator.entry(f, x, false, Target.nearest(Format.BinaryFormat.BINARY64), 4096).entry().bits();
            assertEquals(expected, bits.longValue(), what + " at x = " + x.toDecimalOrFraction() + ": apfloat " + ref.toString(true)
                    + " = " + Double.longBitsToDouble(expected) + ", odetab " + Double.longBitsToDouble(bits.longValue()));
        }
    }

    /**
     * The exact polynomial of f has exactly the coefficients of commons-math3's polynomial:
     * commons-math3 builds them as exact fractions and converts each by one IEEE division of
     * exactly representable integers for the small degrees used here, so each of its doubles is
     * the correct rounding of the exact coefficient.
     */
    static void assertCoefficients(FunctionDef f, PolynomialFunction commons, String what) {
        Poly ours = FunctionEvaluator.polynomial(f).orElseThrow(() -> new AssertionError(what + " is not an exact polynomial"));
        double[] theirs = commons.getCoefficients();
        assertEquals(theirs.length - 1, ours.degree(), what + " degree");
        for (int i = 0; i < theirs.length; i++) {
            Rational c = ours.coefficient(i);
            double rounded = new BigDecimal(c.numerator()).divide(new BigDecimal(c.denominator()), new MathContext(60)).doubleValue();
            assertEquals(theirs[i], rounded, 0.0, what + " coefficient of x^" + i + ": odetab " + c + ", commons-math3 " + theirs[i]);
        }
    }

    /** The command fails with exit 2 and exactly this message. */
    static void assertBadInput(String message, String... args) {
        CliRunner.Result r = CliRunner.run(args);
        assertEquals(2, r.code(), String.join(" ", args) + ": " + r.err());
        assertEquals("odetab: " + message + "\n", r.err());
    }
}
