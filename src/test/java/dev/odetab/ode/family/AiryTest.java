package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.Jet;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Map;
import java.util.Random;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/** Airy functions against DLMF 9.2(ii) closed forms and against apfloat 1.15.0 (ApfloatMath.airyAi …). */
class AiryTest {
    private static final long SEED = Long.getLong("test.seed", 20261202L);
    private static final FunctionDef AI = Airy.ai().define(Map.of());
    private static final FunctionDef BI = Airy.bi().define(Map.of());

    private static BigDecimal decimal(Apfloat a) {
        return new BigDecimal(a.toString(true));
    }

    @Test
    void valuesAtZeroMatchTheClosedFormsAtFiftyDigits() throws Exception {
        // DLMF 9.2.3–9.2.6, evaluated independently by apfloat at 80 digits:
        // Ai(0) = 1/(3^(2/3) Γ(2/3)), Ai'(0) = −1/(3^(1/3) Γ(1/3)), Bi(0) = 1/(3^(1/6) Γ(2/3)), Bi'(0) = 3^(1/6)/Γ(1/3).
        long p = 80;
        Apfloat one = new Apfloat(1, p);
        Apfloat three = new Apfloat(3, p);
        Apfloat g13 = ApfloatMath.gamma(one.divide(three));
        Apfloat g23 = ApfloatMath.gamma(new Apfloat(2, p).divide(three));
        Apfloat r6 = ApfloatMath.root(three, 6);
        BigDecimal[] expected = {
            decimal(one.divide(ApfloatMath.cbrt(new Apfloat(9, p)).multiply(g23))),
            decimal(one.divide(ApfloatMath.cbrt(three).multiply(g13)).negate()),
            decimal(one.divide(r6.multiply(g23))),
            decimal(r6.divide(g13)),
        };
        Jet ai = FunctionEvaluator.enclose(AI, Rational.ZERO, 200).jet();
        Jet bi = FunctionEvaluator.enclose(BI, Rational.ZERO, 200).jet();
        Ball[] got = {ai.value(), ai.derivative(), bi.value(), bi.derivative()};
        String[] names = {"Ai(0)", "Ai'(0)", "Bi(0)", "Bi'(0)"};
        MathContext fifty = new MathContext(50, RoundingMode.HALF_EVEN);
        for (int i = 0; i < 4; i++) {
            BigDecimal e = expected[i].round(fifty);
            assertTrue(got[i].addError(e.ulp()).contains(e), names[i] + ": " + e + " not in " + got[i]);
            assertTrue(got[i].rad().compareTo(e.abs().scaleByPowerOfTen(-55)) < 0, names[i] + " too wide: " + got[i]);
            // and the correctly rounded 50-digit decimal agrees with the closed form rounded to 50 digits
            BigDecimal rounded = FunctionEvaluator.digits(i < 2 ? AI : BI, Rational.ZERO, i % 2 == 1, 50, 4096).value();
            assertEquals(0, rounded.compareTo(e), names[i]);
        }
    }

    @Test
    void randomPointsAreEnclosedAndTheBoundIsHonest() throws Exception {
        Random rnd = new Random(SEED);
        int precBits = 200;
        double worstRatio = 0;
        double sumLogRatio = 0;
        int counted = 0;
        for (int k = 0; k < 200; k++) {
            // an exact decimal in [−12, 8] with 1..6 fractional digits
            int digits = 1 + rnd.nextInt(6);
            long scale = (long) Math.pow(10, digits);
            long n = -12 * scale + (long) Math.floor(rnd.nextDouble() * 20 * scale);
            BigDecimal xd = BigDecimal.valueOf(n, digits);
            Rational x = Rational.of(xd);
            Apfloat ax = new Apfloat(xd, 90);
            for (int which = 0; which < 2; which++) {
                Jet jet = FunctionEvaluator.enclose(which == 0 ? AI : BI, x, precBits).jet();
                BigDecimal v = decimal(which == 0 ? ApfloatMath.airyAi(ax) : ApfloatMath.airyBi(ax));
                BigDecimal d = decimal(which == 0 ? ApfloatMath.airyAiPrime(ax) : ApfloatMath.airyBiPrime(ax));
                String what = (which == 0 ? "Ai" : "Bi") + " at x = " + xd + " (seed " + SEED + ")";
                for (int deriv = 0; deriv < 2; deriv++) {
                    Ball b = deriv == 0 ? jet.value() : jet.derivative();
                    BigDecimal ref = deriv == 0 ? v : d;
                    // apfloat's own error at 90 digits is below one unit of its 80th digit
                    BigDecimal refErr = ref.abs().scaleByPowerOfTen(-80);
                    assertTrue(b.addError(refErr).contains(ref), what + (deriv == 1 ? "'" : "") + ": " + ref + " not in " + b);
                    BigDecimal actual = b.mid().subtract(ref).abs().add(refErr);
                    double ratio = b.rad().divide(actual, MathContext.DECIMAL64).doubleValue();
                    worstRatio = Math.max(worstRatio, ratio);
                    sumLogRatio += Math.log10(ratio);
                    counted++;
                }
            }
        }
        System.out.printf("Airy at 200 random points in [-12, 8], %d bits: claimed radius / actual error: worst %.3g, geometric mean %.3g%n",
                precBits, worstRatio, Math.pow(10, sumLogRatio / counted));
        // Honest: contained above. Not absurdly loose: on average within 10^4 of the actual error.
        assertTrue(sumLogRatio / counted < 4, "radii are on average more than 10^4 times the actual error");
    }
}
