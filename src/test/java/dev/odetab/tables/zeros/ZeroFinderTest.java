package dev.odetab.tables.zeros;

import dev.odetab.tables.Column;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import dev.odetab.series.PrecisionCapException;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
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
import dev.odetab.ode.family.Airy;
import dev.odetab.ode.family.ChebyshevU;
import dev.odetab.ode.family.HermiteFunction;
import dev.odetab.ode.family.HermiteH;
import dev.odetab.ode.family.LegendreP;
import dev.odetab.reference.AiryZerosReferenceData;
import dev.odetab.reference.AiryZerosReferenceData.Kind;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Certified zeros (docs/methods.md §6): the first 50 zeros of Ai, Ai', Bi, Bi' against apfloat root
 * polishing and the asymptotic forms of DLMF 9.9, exact zeros, and the documented behaviour at
 * the edges (no zero, a zero on an end of the search, an exact rational zero that only an
 * enclosure can reach).
 */
class ZeroFinderTest {
    private static final Format B64 = Format.BinaryFormat.BINARY64;

    private static TableResult zeros(FunctionDef f, String from, String to, int count, boolean ofDerivative, List<String> columns,
            Format format, RoundingMode mode, int capBits) throws Exception {
        TableKind.Zeros z = new TableKind.Zeros(Rational.parse(from), Rational.parse(to), count, ofDerivative);
        List<Column> cols = new ArrayList<>();
        for (String c : columns) {
            cols.add(Column.parse(c));
        }
        return TableEvaluator.evaluate(new TableDef("z", f.name(), f, z, cols, Target.of(format, mode), capBits, List.of("csv")));
    }

    private static TableResult zeros(FunctionDef f, String from, String to, boolean ofDerivative, List<String> columns) throws Exception {
        return zeros(f, from, to, 0, ofDerivative, columns, B64, RoundingMode.NEAREST_EVEN, 4096);
    }

    /** y'' + y = 0 with y(0) = y0, y'(0) = y1: sin for (0, 1), cos for (1, 0). */
    private static FunctionDef harmonic(String y0, String y1) throws Exception {
        return new FunctionDef("harmonic", new Equation(Poly.ONE, Poly.ZERO, Poly.ONE), Rational.ZERO,
                ExprParser.parseConstant(y0, Map.of()), ExprParser.parseConstant(y1, Map.of()), Map.of(), "y'' + y = 0");
    }

    private static FunctionDef psi(int n) throws Exception {
        return new HermiteFunction().define(Map.of("n", Rational.of(n)));
    }

    /** The binary64 nearest to v, checked to be the nearest for every value within ±margin of v. */
    private static long nearestBits(BigDecimal v, BigDecimal margin) {
        double lo = v.subtract(margin).doubleValue();
        double hi = v.add(margin).doubleValue();
        assertEquals(lo, hi, "the reference " + v + " is too close to a binary64 rounding boundary to decide");
        return Double.doubleToRawLongBits(lo);
    }

    private static long bits(TableResult r, int row, int col) {
        return r.rows().get(row).entries().get(col).bits().longValue();
    }

    private static BigDecimal value(TableResult r, int row, int col) {
        return r.rows().get(row).entries().get(col).value().toBigDecimalExact();
    }

    @ParameterizedTest
    @EnumSource(Kind.class)
    void firstFiftyAiryZerosMatchApfloatPolishingAndTheAsymptoticForms(Kind kind) throws Exception {
        FunctionDef f = (kind.function.equals("airy-ai") ? Airy.ai() : Airy.bi()).define(Map.of());
        boolean ofDerivative = kind.of.equals("derivative");
        TableResult r = zeros(f, "0", "-60", 50, ofDerivative, List.of("x", ofDerivative ? "value" : "derivative"), B64,
                RoundingMode.NEAREST_EVEN, 4096);
        List<AiryZerosReferenceData.Row> ref = AiryZerosReferenceData.read(kind);
        assertEquals(50, r.rows().size());
        assertTrue(r.proof().startsWith("zeros: 50 found"), r.proof());
        for (int k = 1; k <= 50; k++) {
            AiryZerosReferenceData.Row want = ref.get(k - 1);
            assertEquals(k, want.k());
            // apfloat 1.15.0 Newton polishing to 50 digits (reference file): the correctly rounded binary64 entries
            assertEquals(nearestBits(want.zero(), new BigDecimal("1e-46")), bits(r, k - 1, 0), kind + " zero " + k);
            assertEquals(nearestBits(want.other(), new BigDecimal("1e-46")), bits(r, k - 1, 1), kind + " other column at zero " + k);
            assertNull(r.rows().get(k - 1).x(), "an Airy zero is irrational");
            // DLMF 9.9.6–9.9.9 with T, U of 9.9.18–9.9.19 through t^−4. Error bound used: the remainder is at most the
            // first neglected term (t^(2/3)·|c_3|·t^−6), the enveloping property of these expansions; DLMF 9.9(iv)
            // points to Pittaluga & Sacripante (1991) and Fabijonas & Olver (1999) for bounds (from memory).
            // The table entry adds at most half an ulp of binary64 (IEEE 754-2019).
            BigDecimal x = value(r, k - 1, 0);
            BigDecimal approx = new BigDecimal(AiryZerosReferenceData.asymptotic(kind, k, 40).toString(true));
            BigDecimal bound = new BigDecimal(AiryZerosReferenceData.firstNeglected(kind, k, 40).toString(true))
                    .add(BigDecimal.valueOf(Math.ulp(x.doubleValue())));
            assertTrue(x.subtract(approx).abs().compareTo(bound) <= 0, kind + " zero " + k + ": " + x + " is farther than " + bound
                    + " from the asymptotic form " + approx);
        }
    }

    @Test
    void walkingEitherWayGivesTheSameZeros() throws Exception {
        // the zeros of Ai on [−12, 0] are a_1 … a_9 (apfloat 1.15.0 reference file: a_9 ≈ −11.94, a_10 ≈ −12.83)
        long inside = AiryZerosReferenceData.read(Kind.AI).stream().filter(z -> z.zero().compareTo(BigDecimal.valueOf(-12)) >= 0).count();
        FunctionDef ai = Airy.ai().define(Map.of());
        TableResult down = zeros(ai, "0", "-12", false, List.of("x", "derivative"));
        TableResult up = zeros(ai, "-12", "0", false, List.of("x", "derivative"));
        assertEquals(9, inside);
        assertEquals(inside, down.rows().size());
        for (int i = 0; i < inside; i++) {
            assertEquals(down.rows().get(i).entries(), up.rows().get((int) inside - 1 - i).entries(), "zero " + (i + 1));
        }
    }

    @Test
    void sineZerosAreMultiplesOfPiAndTheValueColumnIsZero() throws Exception {
        // y'' + y = 0, y(0) = 0, y'(0) = 1 is sin: zeros kπ, y' = cos = (−1)^k there (DLMF 4.14, 4.17.1)
        TableResult r = zeros(harmonic("0", "1"), "-10", "10", false, List.of("x", "value", "derivative"));
        assertEquals(7, r.rows().size());
        Apfloat pi = ApfloatMath.pi(60);
        for (int i = 0; i < 7; i++) {
            int k = i - 3;
            BigDecimal kPi = new BigDecimal(pi.multiply(new Apfloat(k)).toString(true));
            assertEquals(k == 0 ? 0L : nearestBits(kPi, new BigDecimal("1e-50")), bits(r, i, 0), "zero " + k + "π (apfloat 1.15.0 pi)");
            // the searched quantity is 0 at its zero: the value column holds +0 (IEEE 754-2019 encoding 0)
            assertEquals(0L, bits(r, i, 1));
            assertEquals(Double.doubleToRawLongBits(k % 2 == 0 ? 1.0 : -1.0), bits(r, i, 2), "cos(" + k + "π)");
        }
        // the zero at the normalization point is exact: its row carries x = 0 itself
        assertEquals(Rational.ZERO, r.rows().get(3).x());
        assertNull(r.rows().get(2).x());
    }

    @Test
    void cosineTurningPointsAreOddMultiplesOfHalfPi() throws Exception {
        // y = cos (y(0) = 1, y'(0) = 0): zeros of y' = −sin at kπ, with y = (−1)^k there (DLMF 4.14); on [−1/2, 7]:
        // 0 (exact: y'(0) = 0 is the normalization) and π, 2π
        TableResult r = zeros(harmonic("1", "0"), "-1/2", "7", true, List.of("x", "value", "derivative"));
        assertEquals(3, r.rows().size());
        assertEquals(Rational.ZERO, r.rows().get(0).x());
        Apfloat pi = ApfloatMath.pi(60);
        for (int k = 0; k < 3; k++) {
            BigDecimal kPi = new BigDecimal(pi.multiply(new Apfloat(k)).toString(true));
            assertEquals(k == 0 ? 0L : nearestBits(kPi, new BigDecimal("1e-50")), bits(r, k, 0), "zero " + k + "π (apfloat 1.15.0 pi)");
            assertEquals(Double.doubleToRawLongBits(k % 2 == 0 ? 1.0 : -1.0), bits(r, k, 1), "cos(" + k + "π)");
            assertEquals(0L, bits(r, k, 2), "the searched y' is +0 at its zero");
        }
    }

    @Test
    void hermiteFunctionZeroAtTheNormalizationPointIsExactEvenOnAnEndOfTheSearch() throws Exception {
        // ψ_1(x) = 2x e^(−x²/2) / sqrt(2 sqrt(π)) (DLMF 18.5.13 via H_1 = 2x): its only zero is 0, and
        // ψ_1'(0) = sqrt(2) / π^(1/4) (apfloat 1.15.0)
        BigDecimal slope = new BigDecimal(ApfloatMath.sqrt(new Apfloat(2, 60)).divide(ApfloatMath.root(ApfloatMath.pi(60), 4))
                .toString(true));
        for (String[] search : new String[][] {{"-3", "3"}, {"0", "3"}, {"-3", "0"}, {"3", "0"}}) {
            TableResult r = zeros(psi(1), search[0], search[1], false, List.of("x", "derivative"));
            assertEquals(1, r.rows().size(), "search from " + search[0] + " to " + search[1]);
            assertEquals(Rational.ZERO, r.rows().get(0).x());
            assertEquals(0L, bits(r, 0, 0), "+0 (IEEE 754-2019)");
            assertEquals(nearestBits(slope, new BigDecimal("1e-50")), bits(r, 0, 1));
        }
    }

    @Test
    void hermiteFunctionZerosAreThoseOfItsPolynomial() throws Exception {
        // ψ_12 = c H_12 e^(−x²/2) (DLMF 18.3 with Table 18.3.1 weight): the same zeros as H_12. ψ_12 is walked by series
        // from −8, far in its decaying tail, H_12 evaluated exactly as a polynomial; every entry must agree, and the
        // zeros are symmetric (DLMF 18.6.1 parity)
        FunctionDef h12 = new HermiteH().define(Map.of("n", Rational.of(12)));
        TableResult series = zeros(psi(12), "-8", "8", false, List.of("x"));
        TableResult exact = zeros(h12, "-8", "8", false, List.of("x"));
        assertEquals(12, series.rows().size());
        assertEquals(12, exact.rows().size());
        for (int i = 0; i < 12; i++) {
            assertEquals(exact.rows().get(i).entries(), series.rows().get(i).entries(), "zero " + (i + 1));
            assertEquals(-Double.longBitsToDouble(bits(series, i, 0)), Double.longBitsToDouble(bits(series, 11 - i, 0)));
        }
    }

    @Test
    void oddHermiteFunctionHasItsMiddleZeroExactly() throws Exception {
        // ψ_3 is odd (DLMF 18.6.1 parity): zeros 0 and ±sqrt(3/2) (H_3 = 8x³ − 12x, DLMF 18.5.13 / Table 18.3.1)
        TableResult r = zeros(psi(3), "-5", "5", 0, false, List.of("x"), Format.BinaryFormat.BINARY32, RoundingMode.NEAREST_EVEN, 4096);
        assertEquals(3, r.rows().size());
        assertEquals(Rational.ZERO, r.rows().get(1).x());
        float s = (float) Math.sqrt(1.5);
        assertEquals(Float.floatToRawIntBits(-s), r.rows().get(0).entries().get(0).bits().intValue());
        assertEquals(Float.floatToRawIntBits(s), r.rows().get(2).entries().get(0).bits().intValue());
    }

    @Test
    void aRationalZeroAwayFromTheNormalizationIsDecidedOnlyWhenItsEnclosureRounds() throws Exception {
        // ψ_1' = (1 − x²) · 2e^(−x²/2) / sqrt(2 sqrt(π)) vanishes at x = ±1 exactly (from DLMF 18.5.13), which no
        // enclosure can prove. Nearest: every point near ±1 rounds to ±1.0, so the entries are decided.
        TableResult r = zeros(psi(1), "-3", "3", true, List.of("x", "value"));
        assertEquals(2, r.rows().size());
        assertEquals(Double.doubleToRawLongBits(-1.0), bits(r, 0, 0));
        assertEquals(Double.doubleToRawLongBits(1.0), bits(r, 1, 0));
        assertNull(r.rows().get(1).x(), "not proven exact");
        // ψ_1(1) = 2 e^(−1/2) / sqrt(2 sqrt(π)) (apfloat 1.15.0)
        Apfloat two = new Apfloat(2, 60);
        BigDecimal psi1 = new BigDecimal(two.multiply(ApfloatMath.exp(new Apfloat(-1, 60).divide(two)))
                .divide(ApfloatMath.sqrt(two.multiply(ApfloatMath.sqrt(ApfloatMath.pi(60))))).toString(true));
        assertEquals(nearestBits(psi1, new BigDecimal("1e-50")), bits(r, 1, 1));
        assertEquals(nearestBits(psi1.negate(), new BigDecimal("1e-50")), bits(r, 0, 1));
        // Rounding down: points just below −1 and at −1 round differently, so the zero is undecided at any precision:
        // exit 3 naming it, never a guessed entry
        PrecisionCapException e = assertThrows(PrecisionCapException.class,
                () -> zeros(psi(1), "-3", "3", 0, true, List.of("x"), B64, RoundingMode.DOWN, 256));
        assertTrue(e.getMessage().contains("near x = -1"), e.getMessage());
        // the same zero as an end of the search: whether it lies inside cannot be decided either
        e = assertThrows(PrecisionCapException.class,
                () -> zeros(psi(1), "-1/2", "1", 0, true, List.of("x"), B64, RoundingMode.NEAREST_EVEN, 256));
        assertTrue(e.getMessage().contains("end of the search, x = 1"), e.getMessage());
    }

    @Test
    void polynomialZerosAreFoundExactlyWhereTheyAreRational() throws Exception {
        // U_2(cos θ) = sin 3θ / sin θ (DLMF 18.5.2): zeros cos(π/3) = 1/2 and −1/2. Rounding down cannot decide
        // them from an enclosure; the exact path proves them.
        FunctionDef u2 = new ChebyshevU().define(Map.of("n", Rational.of(2)));
        TableResult r = zeros(u2, "-9/10", "9/10", 0, false, List.of("x", "derivative"), B64, RoundingMode.DOWN, 4096);
        assertEquals(2, r.rows().size());
        assertEquals(Rational.of(-1, 2), r.rows().get(0).x());
        assertEquals(Rational.of(1, 2), r.rows().get(1).x());
        // U_2 = 4x² − 1 (DLMF 18.5.2 / Table 18.3.1): U_2'(±1/2) = ±4, exact
        assertEquals(Double.doubleToRawLongBits(-4.0), bits(r, 0, 1));
        assertEquals(Double.doubleToRawLongBits(4.0), bits(r, 1, 1));
    }

    @Test
    void legendreZerosOnTheWholeIntervalBetweenItsSingularPoints() throws Exception {
        // P_3 = (5x³ − 3x)/2 (DLMF 18.3, Table 18.3.1 / A&S 22.3.8): zeros −sqrt(3/5), 0, sqrt(3/5); the search may
        // end on the singular points ±1 because a polynomial is evaluated exactly
        FunctionDef p3 = new LegendreP().define(Map.of("n", Rational.of(3)));
        TableResult r = zeros(p3, "-1", "1", false, List.of("x"));
        assertEquals(3, r.rows().size());
        BigDecimal root = new BigDecimal(ApfloatMath.sqrt(new Apfloat(new BigDecimal("0.6"), 60)).toString(true));
        assertEquals(nearestBits(root.negate(), new BigDecimal("1e-50")), bits(r, 0, 0));
        assertEquals(Rational.ZERO, r.rows().get(1).x());
        assertEquals(nearestBits(root, new BigDecimal("1e-50")), bits(r, 2, 0));
    }

    @Test
    void aSearchWithoutZerosOrWithTooFewIsRefused() throws Exception {
        // Ai > 0 on [0, ∞), and its first zeros are a_1 ≈ −2.338, a_2 ≈ −4.088 (DLMF 9.9, Table 9.9.1, from memory)
        FunctionDef ai = Airy.ai().define(Map.of());
        OutOfRangeException none = assertThrows(OutOfRangeException.class,
                () -> zeros(ai, "0", "3", false, List.of("x")));
        assertTrue(none.getMessage().contains("has no zero on [0, 3]"), none.getMessage());
        OutOfRangeException few = assertThrows(OutOfRangeException.class,
                () -> zeros(ai, "0", "-5", 3, false, List.of("x"), B64, RoundingMode.NEAREST_EVEN, 4096));
        assertTrue(few.getMessage().contains("has only 2 zero(s) on [-5, 0] but count = 3"), few.getMessage());
    }

    @Test
    void theProofLineSaysHowTheCountWasProved() throws Exception {
        TableResult r = zeros(Airy.ai().define(Map.of()), "0", "-5", false, List.of("x"));
        assertTrue(r.proof().startsWith("zeros: 2 found on [-5, 0], walking from 0; isolation: "), r.proof());
        assertTrue(r.proof().contains("y of one sign or y' of one sign"), r.proof());
        Entry first = r.rows().get(0).entries().get(0);
        // a_1 = −2.33810 74104 59767 03848 91972… (reference-data/zeros/airy-zeros-apfloat-1.15.0.csv: apfloat 1.15.0,
        // Newton-polished; tabulated in DLMF Table 9.9.1)
        assertEquals(-2.338107410459767, first.value().doubleEstimate());
    }
}
