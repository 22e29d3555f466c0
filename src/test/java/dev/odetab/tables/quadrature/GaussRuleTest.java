package dev.odetab.tables.quadrature;

import dev.odetab.tables.Column;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.ode.family.OrthogonalFamily;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Gauss rules (docs/methods.md §6) against closed forms (Abramowitz &amp; Stegun 25.4, DLMF 3.5(v)),
 * computed independently in apfloat 1.15.0 at 50 digits; the general Christoffel formula
 * against the special rules it must reproduce; and exactness for x^k, k &lt;= 2n − 1, against
 * exact moments (DLMF 5.12.1 Beta integral, DLMF 5.2.1 Gamma integral).
 */
class GaussRuleTest {
    static final long DIGITS = 50;
    static final Format B64 = Format.BinaryFormat.BINARY64;
    static final Format D40 = new Format.DecimalFormat(40);

    static final OrthogonalFamily LEGENDRE = gauss("legendre-p");
    static final OrthogonalFamily HERMITE = gauss("hermite-h");
    static final OrthogonalFamily LAGUERRE = gauss("laguerre-l");
    static final OrthogonalFamily CHEBYSHEV_T = gauss("chebyshev-t");
    static final OrthogonalFamily CHEBYSHEV_U = gauss("chebyshev-u");
    static final OrthogonalFamily GEGENBAUER = gauss("gegenbauer-c");
    static final OrthogonalFamily JACOBI = gauss("jacobi-p");

    /** The catalog's family with a Gauss rule of this name. */
    static OrthogonalFamily gauss(String name) {
        return Catalog.withGaussRules().stream().filter(f -> f.name().equals(name)).findFirst().orElseThrow();
    }

    /** The catalog's member of {@code family} with degree n and rule parameters a (α or λ) and b (β), in the family's order. */
    static FunctionDef definition(OrthogonalFamily family, int n, Rational a, Rational b) throws Exception {
        Map<String, Rational> params = new HashMap<>(Map.of("n", Rational.of(n)));
        List<String> names = family.ruleParameters();
        for (int i = 0; i < names.size(); i++) {
            params.put(names.get(i), i == 0 ? a : b);
        }
        return family.define(params);
    }

    /** The rule of family {@code kind} with n nodes, parameters a (α or λ) and b (β) as exact rationals. */
    static TableResult rule(OrthogonalFamily kind, int n, String a, String b, Format format, RoundingMode mode, boolean flush,
            String... columns) throws Exception {
        Rational ra = a == null ? Rational.ZERO : Rational.parse(a);
        Rational rb = b == null ? Rational.ZERO : Rational.parse(b);
        FunctionDef f = definition(kind, n, ra, rb);
        List<Column> cols = new ArrayList<>();
        for (String c : columns.length == 0 ? new String[] {"node", "weight"} : columns) {
            cols.add(Column.quadrature(c));
        }
        TableDef t = new TableDef("q", kind.name(), f, new TableKind.Quadrature(new GaussPolynomial(kind, n, f.parameters()), flush), cols, Target.of(format, mode), 4096, List.of("csv"));
        return TableEvaluator.evaluate(t);
    }

    static TableResult rule(OrthogonalFamily kind, int n, Format format) throws Exception {
        return rule(kind, n, null, null, format, RoundingMode.NEAREST_EVEN, false);
    }

    static Apfloat ap(String v) {
        return new Apfloat(v, DIGITS);
    }

    static BigDecimal big(Apfloat v) {
        return new BigDecimal(v.toString(true));
    }

    /** The binary64 nearest-even bits of a 50-digit value (BigDecimal.doubleValue is correctly rounded, as Double.parseDouble). */
    static long bits(Apfloat v) {
        return Double.doubleToRawLongBits(big(v).doubleValue());
    }

    /** Compares a row's node and weight with expected values: binary64 bits, or the 40 digits. */
    static void assertRow(TableResult r, int i, Apfloat node, Apfloat weight, String what) {
        Entry x = r.rows().get(i).entries().get(0);
        Entry w = r.rows().get(i).entries().get(1);
        if (r.table().format() instanceof Format.BinaryFormat) {
            assertEquals(bits(node), x.bits().longValue(), what + ": node " + (i + 1));
            assertEquals(bits(weight), w.bits().longValue(), what + ": weight " + (i + 1));
        } else {
            MathContext mc = new MathContext(40, java.math.RoundingMode.HALF_EVEN);
            assertEquals(0, big(node).round(mc).compareTo(x.value().toBigDecimal(mc)), what + ": node " + (i + 1));
            assertEquals(0, big(weight).round(mc).compareTo(w.value().toBigDecimal(mc)), what + ": weight " + (i + 1));
        }
    }

    @Test
    void gaussLegendreClosedFormsForTwoThreeAndFivePoints() throws Exception {
        for (Format f : List.of(B64, D40)) {
            // A&S Table 25.4 (nodes and weights; the weights by formula 25.4.29), recalled from memory and derived again from P_2 = (3x² − 1)/2, P_3 = (5x³ − 3x)/2):
            // n = 2: ±1/√3, weights 1; n = 3: 0, ±√(3/5), weights 8/9, 5/9
            Apfloat s3 = ApfloatMath.sqrt(ap("3"));
            TableResult r2 = rule(LEGENDRE, 2, f);
            assertRow(r2, 0, ap("-1").divide(s3), ap("1"), "GL2");
            assertRow(r2, 1, ap("1").divide(s3), ap("1"), "GL2");
            Apfloat s35 = ApfloatMath.sqrt(ap("3").divide(ap("5")));
            TableResult r3 = rule(LEGENDRE, 3, f);
            assertRow(r3, 0, s35.negate(), ap("5").divide(ap("9")), "GL3");
            assertRow(r3, 1, ap("0"), ap("8").divide(ap("9")), "GL3");
            assertRow(r3, 2, s35, ap("5").divide(ap("9")), "GL3");
            assertEquals(Rational.ZERO, r3.rows().get(1).x(), "the middle node is exactly 0");
            // n = 5 (zeros of P_5 = (63x⁵ − 70x³ + 15x)/8, DLMF Table 18.3.1 / 18.5.13 family):
            // ±(1/3)√(5 ∓ 2√(10/7)), 0; weights (322 ± 13√70)/900, 128/225
            Apfloat r107 = ApfloatMath.sqrt(ap("10").divide(ap("7")));
            Apfloat inner = ApfloatMath.sqrt(ap("5").subtract(ap("2").multiply(r107))).divide(ap("3"));
            Apfloat outer = ApfloatMath.sqrt(ap("5").add(ap("2").multiply(r107))).divide(ap("3"));
            Apfloat s70 = ApfloatMath.sqrt(ap("70"));
            Apfloat wInner = ap("322").add(ap("13").multiply(s70)).divide(ap("900"));
            Apfloat wOuter = ap("322").subtract(ap("13").multiply(s70)).divide(ap("900"));
            TableResult r5 = rule(LEGENDRE, 5, f);
            assertRow(r5, 0, outer.negate(), wOuter, "GL5");
            assertRow(r5, 1, inner.negate(), wInner, "GL5");
            assertRow(r5, 2, ap("0"), ap("128").divide(ap("225")), "GL5");
            assertRow(r5, 3, inner, wInner, "GL5");
            assertRow(r5, 4, outer, wOuter, "GL5");
        }
    }

    @Test
    void onePointRulesHoldTheZeroOfP1AndTheWholeMoment() throws Exception {
        // n = 1: the node is the zero of p_1 and the weight is μ_0 = ∫ w (exact for constants and x).
        // Legendre: P_1 = x, μ_0 = 2; Hermite: H_1 = 2x, μ_0 = √π (DLMF 5.2.1 with Γ(1/2) = √π);
        // Jacobi: P_1^(α,β) = (α+β+2)x/2 + (α−β)/2 (DLMF 18.5.7), node (β−α)/(α+β+2), μ_0 of DLMF 5.12.1
        for (Format f : List.of(B64, D40)) {
            TableResult p1 = rule(LEGENDRE, 1, f);
            assertRow(p1, 0, ap("0"), ap("2"), "GL1");
            assertEquals(Rational.ZERO, p1.rows().get(0).x());
            assertRow(rule(HERMITE, 1, f), 0, ap("0"), ApfloatMath.sqrt(ApfloatMath.pi(DIGITS)), "GH1");
            TableResult j1 = rule(JACOBI, 1, "1/2", "2", f, RoundingMode.NEAREST_EVEN, false);
            assertRow(j1, 0, ap("3").divide(ap("9")), mu0(JACOBI, Rational.of(1, 2), Rational.TWO), "GJ1");
        }
    }

    @Test
    void gaussHermiteClosedFormsForTwoAndThreePoints() throws Exception {
        // A&S 25.4.46 with H_2 = 4x² − 2, H_3 = 8x³ − 12x (DLMF Table 18.3.1): n = 2: ±1/√2, w = √π/2;
        // n = 3: 0, ±√(3/2), w = 2√π/3 at 0 and √π/6 at ±√(3/2)
        Apfloat sqrtPi = ApfloatMath.sqrt(ApfloatMath.pi(DIGITS));
        for (Format f : List.of(B64, D40)) {
            TableResult r2 = rule(HERMITE, 2, f);
            Apfloat x2 = ap("1").divide(ApfloatMath.sqrt(ap("2")));
            assertRow(r2, 0, x2.negate(), sqrtPi.divide(ap("2")), "GH2");
            assertRow(r2, 1, x2, sqrtPi.divide(ap("2")), "GH2");
            TableResult r3 = rule(HERMITE, 3, f);
            Apfloat x3 = ApfloatMath.sqrt(ap("3").divide(ap("2")));
            assertRow(r3, 0, x3.negate(), sqrtPi.divide(ap("6")), "GH3");
            assertRow(r3, 1, ap("0"), sqrtPi.multiply(ap("2")).divide(ap("3")), "GH3");
            assertRow(r3, 2, x3, sqrtPi.divide(ap("6")), "GH3");
        }
    }

    static final Apfloat PI = ApfloatMath.pi(DIGITS + 10);

    /**
     * cos(jπ/m) for j = 0 … m in apfloat: one cosine, then cos((j+1)θ) = 2 cos θ cos(jθ) − cos((j−1)θ)
     * (T_j(cos θ) = cos jθ, DLMF 18.5.1), whose absolute rounding errors stay below j² 10^-58; apfloat
     * would lower the precision it claims at each cancellation, so each step is given back the working
     * precision (the absolute error bound above is what matters). cos(π/2) = 0 exactly.
     */
    static Apfloat[] cosMultiples(long m) {
        Apfloat[] c = new Apfloat[(int) m + 1];
        c[0] = new Apfloat(1, DIGITS + 10);
        c[1] = ApfloatMath.cos(PI.divide(new Apfloat(m, DIGITS + 10)));
        for (int j = 1; j < m; j++) {
            c[j + 1] = new Apfloat(2, DIGITS + 10).multiply(c[1]).multiply(c[j]).subtract(c[j - 1]).precision(DIGITS + 10);
        }
        if (m % 2 == 0) {
            c[(int) (m / 2)] = ap("0");
        }
        return c;
    }

    @Test
    void gaussChebyshevClosedFormsForEveryN() throws Exception {
        Apfloat pi = ApfloatMath.pi(DIGITS);
        List<Integer> sizes = new ArrayList<>();
        for (int n = 1; n <= 24; n++) {
            sizes.add(n);
        }
        sizes.add(97);
        for (int n : sizes) {
            // DLMF 3.5.23 / A&S 25.4.38: x_k = cos((2k − 1)π/(2n)), w = π/n
            TableResult t = rule(CHEBYSHEV_T, n, B64);
            // DLMF 3.5(v) / A&S 25.4.40: x_k = cos(kπ/(n + 1)), w = π/(n + 1) sin²(kπ/(n + 1))
            TableResult u = rule(CHEBYSHEV_U, n, B64);
            Apfloat[] ct = cosMultiples(2L * n);
            Apfloat[] cu = cosMultiples(n + 1L);
            for (int i = 0; i < n; i++) {
                int k = n - i;
                assertRow(t, i, ct[2 * k - 1], pi.divide(new Apfloat(n, DIGITS)), "T, n = " + n);
                Apfloat sin2 = ap("1").subtract(cu[k].multiply(cu[k]));
                assertRow(u, i, cu[k], pi.divide(new Apfloat(n + 1L, DIGITS)).multiply(sin2), "U, n = " + n);
            }
        }
    }

    /** Entry-for-entry equality of two tables (same exact values give the same correctly rounded entries). */
    static void assertSameRule(TableResult expected, TableResult actual, String what) {
        assertEquals(expected.rows().size(), actual.rows().size(), what);
        for (int i = 0; i < expected.rows().size(); i++) {
            assertEquals(expected.rows().get(i).entries(), actual.rows().get(i).entries(), what + ", row " + (i + 1));
        }
    }

    @Test
    void generalChristoffelFormulaReproducesTheLegendreAndChebyshevRules() throws Exception {
        RoundingMode ne = RoundingMode.NEAREST_EVEN;
        for (Format f : List.of(B64, D40)) {
            // docs/methods.md §6: the Jacobi weight 2^(α+β+1) Γ(n+α+1)Γ(n+β+1)/(Γ(n+α+β+1) n! (1−x²) P'²) (Szegő 15.3.1)
            // at α = β = 0 is the Legendre rule (P^(0,0) = P, DLMF 18.7.9), at α = β = −1/2 the Chebyshev T
            // rule (DLMF 18.7.3) and at α = β = 1/2 the Chebyshev U rule (DLMF 18.7.4) in closed form;
            // Gegenbauer λ = 1/2 is Legendre and λ = 1 is Chebyshev U (DLMF 18.7.9, 18.7.4).
            assertSameRule(rule(LEGENDRE, 10, f), rule(JACOBI, 10, "0", "0", f, ne, false), "Jacobi(0,0)");
            assertSameRule(rule(CHEBYSHEV_T, 9, f), rule(JACOBI, 9, "-1/2", "-1/2", f, ne, false),
                    "Jacobi(-1/2,-1/2)");
            assertSameRule(rule(CHEBYSHEV_U, 11, f), rule(JACOBI, 11, "1/2", "1/2", f, ne, false),
                    "Jacobi(1/2,1/2)");
            assertSameRule(rule(LEGENDRE, 9, f), rule(GEGENBAUER, 9, "1/2", null, f, ne, false),
                    "Gegenbauer(1/2)");
            assertSameRule(rule(CHEBYSHEV_U, 8, f), rule(GEGENBAUER, 8, "1", null, f, ne, false),
                    "Gegenbauer(1)");
        }
    }

    /**
     * The exact moment M_k of x^k divided by μ_0 = M_0, as a rational, and μ_0 in apfloat.
     * Jacobi weight (1−x)^α (1+x)^β: with x = 2u − 1 and the Beta integral (DLMF 5.12.1) with
     * Γ(a + j) = Γ(a) (a)_j (DLMF 5.2.5), M_k/μ_0 = Σ_j C(k, j) 2^j (−1)^(k−j) (β+1)_j/(α+β+2)_j and
     * μ_0 = 2^(α+β+1) Γ(α+1) Γ(β+1)/Γ(α+β+2). Hermite: M_k = Γ((k+1)/2) for even k, 0 for odd
     * (DLMF 5.2.1), so M_k/√π = Π_(j=1..k/2) (2j − 1)/2. Laguerre: M_k = Γ(k+α+1) = Γ(α+1) (α+1)_k.
     */
    static Rational momentRatio(OrthogonalFamily kind, Rational alpha, Rational beta, int k) {
        switch (kind.interval()) {
            case REAL_LINE -> {
                if (k % 2 == 1) {
                    return Rational.ZERO;
                }
                Rational m = Rational.ONE;
                for (int j = 1; j <= k / 2; j++) {
                    m = m.multiply(Rational.of(2L * j - 1, 2));
                }
                return m;
            }
            case HALF_LINE -> {
                Rational m = Rational.ONE;
                for (int j = 1; j <= k; j++) {
                    m = m.multiply(alpha.add(Rational.of(j)));
                }
                return m;
            }
            default -> {
                // term_j = C(k, j) 2^j (−1)^(k−j) (β+1)_j/(α+β+2)_j, each from the one before
                Rational sum = Rational.ZERO;
                Rational term = Rational.of(k % 2 == 0 ? 1 : -1);
                for (int j = 0; j <= k; j++) {
                    sum = sum.add(term);
                    term = term.multiply(Rational.of(-2L * (k - j), j + 1L)).multiply(beta.add(Rational.of(j + 1L)))
                            .divide(alpha.add(beta).add(Rational.of(j + 2L)));
                }
                return sum;
            }
        }
    }

    static Apfloat gamma(Rational q) {
        return ApfloatMath.gamma(new Apfloat(q.numerator(), DIGITS + 10).divide(new Apfloat(q.denominator(), DIGITS + 10)));
    }

    static Apfloat mu0(OrthogonalFamily kind, Rational alpha, Rational beta) {
        return switch (kind.interval()) {
            case REAL_LINE -> ApfloatMath.sqrt(ApfloatMath.pi(DIGITS + 10));
            case HALF_LINE -> gamma(alpha.add(Rational.ONE));
            case FINITE -> {
                Rational e = alpha.add(beta).add(Rational.ONE);
                Apfloat two = ApfloatMath.pow(new Apfloat(2, DIGITS + 10),
                        new Apfloat(e.numerator(), DIGITS + 10).divide(new Apfloat(e.denominator(), DIGITS + 10)));
                yield two.multiply(gamma(alpha.add(Rational.ONE))).multiply(gamma(beta.add(Rational.ONE)))
                        .divide(gamma(alpha.add(beta).add(Rational.TWO)));
            }
        };
    }

    /**
     * Exactness to rounding: with entries x̂ = x(1 + δ), ŵ = w(1 + ε), |δ|, |ε| &lt;= u (u = 2^-53 for
     * binary64, 10^(1−N)/2 for decimal:N, nearest), and Σ w x^k = M_k exactly for k &lt;= 2n − 1,
     * |Σ ŵ x̂^k − M_k| &lt;= Σ w |x|^k ((1+u)^(k+1) − 1) &lt;= ((1+u)^(k+1) − 1)/(1−u)^(k+1) Σ ŵ |x̂|^k
     * (weights are positive). The sums of entries carry 100 digits; M_k = μ_0 (M_k/μ_0) with μ_0 to
     * 60 digits, whose error is far below the bound.
     */
    static void assertExact(OrthogonalFamily kind, int n, String a, String b, Format f) throws Exception {
        Rational alpha = a == null ? Rational.ZERO : Rational.parse(a);
        Rational beta = b == null ? Rational.ZERO : Rational.parse(b);
        // the Jacobi parameters of the weight function (DLMF 18.7.1, 18.7.3, 18.7.4, 18.7.9)
        if (kind == LEGENDRE || kind == CHEBYSHEV_T || kind == CHEBYSHEV_U) {
            Rational e = kind == LEGENDRE ? Rational.ZERO : Rational.of(kind == CHEBYSHEV_T ? -1 : 1, 2);
            alpha = e;
            beta = e;
        } else if (kind == GEGENBAUER) {
            alpha = alpha.subtract(Rational.of(1, 2));
            beta = alpha;
        }
        TableResult r = rule(kind, n, a, b, f, RoundingMode.NEAREST_EVEN, false);
        Rational u = f instanceof Format.DecimalFormat d ? Rational.of(10).pow(1 - d.digits()).divide(Rational.TWO) : Rational.TWO.pow(-53);
        BigDecimal mu0 = big(mu0(kind, alpha, beta));
        MathContext mc = new MathContext(100);
        int size = r.rows().size();
        BigDecimal[] x = new BigDecimal[size];
        BigDecimal[] w = new BigDecimal[size];
        BigDecimal[] power = new BigDecimal[size];
        for (int i = 0; i < size; i++) {
            x[i] = r.rows().get(i).entries().get(0).value().toBigDecimalExact();
            w[i] = r.rows().get(i).entries().get(1).value().toBigDecimalExact();
            power[i] = BigDecimal.ONE;
        }
        // the bound's factor to 60 digits, rounded away from the exact factor's side (up, and down in the divisor)
        MathContext up = new MathContext(60, java.math.RoundingMode.UP);
        MathContext down = new MathContext(60, java.math.RoundingMode.DOWN);
        BigDecimal onePlusU = BigDecimal.ONE.add(u.toBigDecimalExact());
        BigDecimal oneMinusU = BigDecimal.ONE.subtract(u.toBigDecimalExact());
        for (int k = 0; k <= 2 * n - 1; k++) {
            BigDecimal sum = BigDecimal.ZERO;
            BigDecimal absSum = BigDecimal.ZERO;
            for (int i = 0; i < size; i++) {
                BigDecimal term = w[i].multiply(power[i], mc);
                sum = sum.add(term, mc);
                absSum = absSum.add(term.abs(), mc);
                power[i] = power[i].multiply(x[i], mc);
            }
            // the sums carry 100 digits: each of the (k + 2) size roundings per term is below 10^-99
            // relative, so 10^-95 Σ ŵ|x̂|^k covers them (with k, size < 10^3)
            BigDecimal growth = onePlusU.pow(k + 1, up).subtract(BigDecimal.ONE).divide(oneMinusU.pow(k + 1, down), up);
            BigDecimal tolerance = growth.add(BigDecimal.ONE.scaleByPowerOfTen(-95)).multiply(absSum, mc);
            Rational ratio = momentRatio(kind, alpha, beta, k);
            BigDecimal moment = mu0.multiply(ratio.toBigDecimal(mc), mc);
            BigDecimal error = sum.subtract(moment).abs();
            assertTrue(error.compareTo(tolerance) <= 0, kind.name() + " n = " + n + " " + f.name() + ", x^" + k + ": |Σ w x^k − M_k| = "
                    + error + " > " + tolerance);
        }
    }

    @Test
    void everyRuleIntegratesPolynomialsUpToDegreeTwoNMinusOne() throws Exception {
        assertExact(LEGENDRE, 7, null, null, B64);
        assertExact(LEGENDRE, 40, null, null, D40);
        assertExact(HERMITE, 20, null, null, B64);
        assertExact(HERMITE, 33, null, null, D40);
        assertExact(LAGUERRE, 12, null, null, B64);
        assertExact(LAGUERRE, 15, "-1/3", null, D40);
        assertExact(CHEBYSHEV_T, 11, null, null, B64);
        assertExact(CHEBYSHEV_U, 10, null, null, D40);
        assertExact(GEGENBAUER, 9, "3/4", null, B64);
        assertExact(GEGENBAUER, 12, "-1/4", null, D40);
        assertExact(JACOBI, 8, "1/2", "-1/3", B64);
        assertExact(JACOBI, 13, "2", "5", D40);
    }

    @Test
    @Tag("slow")
    void fiveHundredPointRulesAreExactToRounding() throws Exception {
        // issue 6: n up to at least 500 for Legendre and Hermite, binary64 and decimal:40. Gauss–Hermite
        // n = 500 in binary64 has weights below 2^-1022 (nodes out to x ≈ 31, w ≈ e^(−x²)): its scaled
        // weights are checked against the decimal:40 rule instead (A&S 25.4.46 with the factor e^(x²)).
        assertExact(LEGENDRE, 500, null, null, B64);
        assertExact(LEGENDRE, 500, null, null, D40);
        assertExact(HERMITE, 500, null, null, D40);
        TableResult scaled = rule(HERMITE, 500, null, null, B64, RoundingMode.NEAREST_EVEN, false, "node", "scaled_weight");
        TableResult reference = rule(HERMITE, 500, D40);
        for (int i = 0; i < 500; i++) {
            BigDecimal x40 = reference.rows().get(i).entries().get(0).value().toBigDecimalExact();
            BigDecimal w40 = reference.rows().get(i).entries().get(1).value().toBigDecimalExact();
            assertEquals(Double.doubleToRawLongBits(x40.doubleValue()), scaled.rows().get(i).entries().get(0).bits().longValue(), "node " + (i + 1));
            Apfloat sw = new Apfloat(w40, DIGITS).multiply(ApfloatMath.exp(new Apfloat(x40, DIGITS).multiply(new Apfloat(x40, DIGITS))));
            assertEquals(bits(sw), scaled.rows().get(i).entries().get(1).bits().longValue(), "scaled weight " + (i + 1));
        }
    }

    @Test
    void rationalZerosAtRoundingBoundariesAreFoundExactly() throws Exception {
        // L_1^(α)(x) = α + 1 − x (DLMF 18.5.12): the one node is α + 1 and its weight μ_0 = Γ(α + 1).
        // α = 1/10: the node 11/10 is a decimal rounding boundary when rounding down; the dyadic
        // centers never hit it, so the boundary test by exact evaluation must.
        TableResult r = rule(LAGUERRE, 1, "1/10", null, new Format.DecimalFormat(5), RoundingMode.DOWN, false);
        assertEquals(Rational.of(11, 10), r.rows().get(0).x());
        assertEquals("1.1000", r.rows().get(0).entries().get(0).decimalText());
        // Γ(1.1) = 0.95135076986687318… (DLMF 5.4, from memory; checked with apfloat)
        assertEquals(big(gamma(Rational.of(11, 10))).round(new MathContext(5, java.math.RoundingMode.DOWN)),
                r.rows().get(0).entries().get(1).value().toBigDecimalExact());
        // Gauss–Legendre n = 2 rounded down: weights exactly 1 (A&S 25.4.29), nodes ±1/√3 rounded down
        TableResult gl2 = rule(LEGENDRE, 2, null, null, B64, RoundingMode.DOWN, false);
        // the binary64 neighbours of 1/√3 (irrational, so strictly between them): down(1/√3) and
        // down(−1/√3) = −up(1/√3)
        BigDecimal x = big(ap("1").divide(ApfloatMath.sqrt(ap("3"))));
        double nearest = x.doubleValue();
        double below = new BigDecimal(nearest).compareTo(x) > 0 ? Math.nextDown(nearest) : nearest;
        double above = Math.nextUp(below);
        assertEquals(Double.doubleToRawLongBits(-above), gl2.rows().get(0).entries().get(0).bits().longValue());
        assertEquals(Double.doubleToRawLongBits(below), gl2.rows().get(1).entries().get(0).bits().longValue());
        for (TableResult.Row row : gl2.rows()) {
            assertEquals(Rational.ONE, row.entries().get(1).value());
            assertNull(row.x(), "±1/√3 is irrational");
        }
    }

    @Test
    void weightsBelowTheNormalRangeAreAnErrorOrFlushedAndFlagged() throws Exception {
        // Gauss–Hermite n = 100: the outer weights are about e^(−x²) with x near 13.4, below the smallest
        // normal binary32 number 2^-126 (IEEE 754-2019 §3.3, §7.5)
        OrthogonalFamily h = HERMITE;
        Format b32 = Format.BinaryFormat.BINARY32;
        OutOfRangeException e = assertThrows(OutOfRangeException.class,
                () -> rule(h, 100, null, null, b32, RoundingMode.NEAREST_EVEN, false, "node", "weight"));
        assertTrue(e.getMessage().contains("underflow binary32") && e.getMessage().contains("weight_underflow = \"flush\"")
                && e.getMessage().contains("scaled_weight"), e.getMessage());
        TableResult flushed = rule(h, 100, null, null, b32, RoundingMode.NEAREST_EVEN, true, "node", "weight", "weight_flag");
        TableResult reference = rule(h, 100, D40);
        TableResult scaled = rule(h, 100, null, null, b32, RoundingMode.NEAREST_EVEN, false, "node", "scaled_weight");
        int flags = 0;
        for (int i = 0; i < 100; i++) {
            List<Entry> row = flushed.rows().get(i).entries();
            BigDecimal w40 = reference.rows().get(i).entries().get(1).value().toBigDecimalExact();
            BigDecimal x40 = reference.rows().get(i).entries().get(0).value().toBigDecimalExact();
            // BigDecimal.floatValue rounds correctly (nearest-even, as Float.parseFloat); the 40-digit
            // reference is the exact weight to 10^-40 relative, far closer than any binary32 rounding boundary
            float expected = w40.floatValue();
            boolean tiny = Math.abs(expected) < Float.MIN_NORMAL;
            assertEquals(tiny ? 1.0 : 0.0, row.get(2).value().doubleEstimate(), "flag at node " + (i + 1));
            assertEquals(Float.floatToRawIntBits(tiny ? 0f : expected), row.get(1).bits().intValue(), "weight at node " + (i + 1));
            flags += tiny ? 1 : 0;
            // scaled weight w·e^(x²) (A&S 25.4.46 with the factor e^(x²)), from the 40-digit node and weight
            Apfloat sw = new Apfloat(w40, DIGITS).multiply(ApfloatMath.exp(new Apfloat(x40, DIGITS).multiply(new Apfloat(x40, DIGITS))));
            assertEquals(Float.floatToRawIntBits(big(sw).floatValue()), scaled.rows().get(i).entries().get(1).bits().intValue(),
                    "scaled weight at node " + (i + 1));
        }
        assertTrue(flags >= 2 && flags % 2 == 0, "the outermost weights underflow in symmetric pairs: " + flags);
    }
}
