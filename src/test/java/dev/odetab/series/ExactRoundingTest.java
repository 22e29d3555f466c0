package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.expr.ExprParser;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Legendre polynomials at dyadic points chosen so that the value is exactly representable or
 * exactly a rounding midpoint (built on purpose): the exact path must round them as IEEE
 * 754-2019 §4.3.1 says (ties to even), judged by Java's correctly rounded
 * BigDecimal.doubleValue/floatValue (Java SE API), which never sees odetab's code.
 */
class ExactRoundingTest {
    /** Legendre's equation (DLMF 14.2.1, μ = 0) with y(0) = P_n(0), y'(0) = P_n'(0) from DLMF 18.5.5 via the recurrence of DLMF 18.9.1. */
    private static FunctionDef legendre(int n) throws Exception {
        Poly[] p = {Poly.ONE, Poly.X};
        for (int k = 1; k < n; k++) {
            // (k+1) P_{k+1} = (2k+1) x P_k − k P_{k−1}
            Poly next = Poly.X.multiply(p[1]).scale(Rational.of(2L * k + 1)).subtract(p[0].scale(Rational.of(k)))
                    .scale(Rational.of(1, k + 1));
            p = new Poly[] {p[1], next};
        }
        Poly pn = n == 0 ? Poly.ONE : p[1];
        Equation eq = new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)), Poly.of(Rational.ZERO, Rational.of(-2)),
                Poly.constant(Rational.of((long) n * (n + 1))));
        return new FunctionDef("P" + n, eq, Rational.ZERO,
                ExprParser.parseConstant(pn.evaluate(Rational.ZERO).toString(), Map.of()),
                ExprParser.parseConstant(pn.derivative().evaluate(Rational.ZERO).toString(), Map.of()), Map.of(), "DLMF 18.9.1");
    }

    /** The odd part's bit length of the numerator of a dyadic rational: its significant bits. */
    private static int significantBits(Rational r) {
        BigInteger n = r.numerator().abs();
        return n.shiftRight(n.getLowestSetBit()).bitLength();
    }

    @Test
    void midpointsAndExactValuesRoundAsIeeeSays() throws Exception {
        int midpoints32 = 0;
        int midpoints64 = 0;
        int exact = 0;
        for (int n : new int[] {2, 3, 4, 5}) {
            FunctionDef f = legendre(n);
            Poly pn = FunctionEvaluator.polynomial(f).orElseThrow();
            for (int m = 1; m <= 12; m++) {
                for (long k = -(1L << m); k <= (1L << m); k += 1) {
                    Rational x = Rational.of(BigInteger.valueOf(k), BigInteger.ONE.shiftLeft(m));
                    Rational v = pn.evaluate(x);
                    if (v.isZero()) {
                        continue;
                    }
                    int bits = significantBits(v);
                    boolean mid32 = bits == 25;
                    boolean mid64 = bits == 54;
                    boolean repr = bits <= 24;
                    if (!(mid32 || mid64 || repr)) {
                        continue;
                    }
                    BigDecimal exactDecimal = v.toBigDecimalExact();
                    for (RoundingMode mode : new RoundingMode[] {RoundingMode.NEAREST_EVEN}) {
                        Entry e64 = FunctionEvaluator.entry(f, x, false, Target.of(Format.BinaryFormat.BINARY64, mode), 256).entry();
                        Entry e32 = FunctionEvaluator.entry(f, x, false, Target.of(Format.BinaryFormat.BINARY32, mode), 256).entry();
                        String what = "P" + n + "(" + x + ") = " + exactDecimal.toPlainString();
                        assertEquals(Double.doubleToRawLongBits(exactDecimal.doubleValue()), e64.bits().longValue(), what + " binary64");
                        assertEquals(Float.floatToRawIntBits(exactDecimal.floatValue()), e32.bits().intValue(), what + " binary32");
                    }
                    midpoints32 += mid32 ? 1 : 0;
                    midpoints64 += mid64 ? 1 : 0;
                    exact += repr ? 1 : 0;
                }
            }
        }
        System.out.printf("Legendre at dyadic points: %d binary32 midpoints, %d binary64 midpoints, %d exactly representable%n",
                midpoints32, midpoints64, exact);
        assertTrue(midpoints32 >= 5, "too few binary32 midpoints built: " + midpoints32);
        assertTrue(exact >= 50, "too few exact cases built: " + exact);
    }

    @Test
    void directedModesAtAnExactValueKeepIt() throws Exception {
        // P_2(1/2) = −1/8 exactly (DLMF 18.5.5: P_2 = (3x² − 1)/2): every mode must give −1/8 itself.
        FunctionDef f = legendre(2);
        for (RoundingMode mode : RoundingMode.values()) {
            Entry e = FunctionEvaluator.entry(f, Rational.of(1, 2), false, Target.of(Format.BinaryFormat.BINARY64, mode), 256).entry();
            assertEquals(Rational.of(-1, 8), e.value(), mode.spelling());
        }
    }
}
