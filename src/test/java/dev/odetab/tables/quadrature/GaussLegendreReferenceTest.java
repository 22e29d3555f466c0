package dev.odetab.tables.quadrature;

import dev.odetab.tables.TableResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Gauss–Legendre rules against two outside references: apfloat 1.15.0 root polishing at 60
 * digits (the correctly rounded binary64 entries must be equal) and commons-math3 3.6.1's
 * high-precision rule, {@code GaussIntegratorFactory.legendreHighPrecision}, which is not
 * correctly rounded (tolerance derived in {@link #assertCommonsAgrees}).
 */
class GaussLegendreReferenceTest {
    private static final long P = 60;

    /**
     * Polishes odetab's node x by Newton's method on P_n in apfloat (P_n and P_n' from Bonnet's
     * recurrence (k+1) P_(k+1) = (2k+1) x P_k − k P_(k−1) and (1 − x²) P_n' = n (P_(n−1) − x P_n),
     * DLMF 18.9.1 Table 18.9.1 and 18.9.19 for Legendre) and returns {node, weight} with
     * w = 2/((1 − x²) P_n'(x)²) (A&amp;S 25.4.29). Starting from a binary64 node (16 digits),
     * three steps reach 60 digits; four are taken. apfloat lowers the precision it claims at every
     * cancelling subtraction; the forward recurrence of P_k on [−1, 1] loses only a few digits in
     * fact (|P_k| &lt;= 1, DLMF 18.14.1, errors grow about linearly in k), so each step is given back
     * the working precision.
     */
    static Apfloat[] polished(int n, Apfloat x0) {
        Apfloat x = x0;
        Apfloat[] pd = null;
        for (int it = 0; it < 5; it++) {
            pd = legendre(n, x);
            if (pd[0].signum() == 0 || it == 4) {
                break;
            }
            x = x.subtract(pd[0].divide(pd[1]));
        }
        Apfloat one = new Apfloat(1, P);
        Apfloat w = new Apfloat(2, P).divide(one.subtract(x.multiply(x)).multiply(pd[1]).multiply(pd[1]));
        return new Apfloat[] {x, w};
    }

    private static Apfloat[] legendre(int n, Apfloat x) {
        Apfloat previous = new Apfloat(1, P);
        Apfloat current = x;
        for (int k = 1; k < n; k++) {
            Apfloat next = new Apfloat(2L * k + 1, P).multiply(x).multiply(current).subtract(new Apfloat(k, P).multiply(previous))
                    .divide(new Apfloat(k + 1L, P)).precision(P);
            previous = current;
            current = next;
        }
        Apfloat one = new Apfloat(1, P);
        Apfloat slope = new Apfloat(n, P).multiply(previous.subtract(x.multiply(current))).divide(one.subtract(x.multiply(x)));
        return new Apfloat[] {current, slope};
    }

    private static BigDecimal big(Apfloat v) {
        return new BigDecimal(v.toString(true));
    }

    /** Every entry equals the binary64 rounding (BigDecimal.doubleValue, nearest-even) of the polished 60-digit value. */
    static void assertApfloatAgrees(int n, TableResult r) {
        for (int i = 0; i < n; i++) {
            List<Entry> row = r.rows().get(i).entries();
            Apfloat[] xw = polished(n, new Apfloat(row.get(0).value().toBigDecimalExact(), P));
            assertEquals(Double.doubleToRawLongBits(big(xw[0]).doubleValue()), row.get(0).bits().longValue(), "n = " + n + ", node " + (i + 1));
            assertEquals(Double.doubleToRawLongBits(big(xw[1]).doubleValue()), row.get(1).bits().longValue(), "n = " + n + ", weight " + (i + 1));
        }
    }

    /**
     * commons-math3 3.6.1 builds the rule in BigDecimal arithmetic at 34 digits (MathContext
     * DECIMAL128): each zero by bisection until the bracket is at most 10 units of the 34th digit
     * of the midpoint (relative 10^-32), the weight as 2(1 − x²)/(n (P_(n−1) − x P_n))² with the
     * polynomials from Bonnet's recurrence. Forward recurrence errors of Legendre polynomials grow
     * about linearly (n &lt;= 200: below 10^-30 relative), and 1 − x² cancels at most
     * log10(n²) &lt; 4.7 digits (1 − x² &gt; 1/n² at every node for these n); so its nodes and
     * weights are within 10^-26 relative of the exact values (measured: 4e-33 and 4e-30 up to
     * n = 189). It then converts them with BigDecimal.doubleValue (nearest-even). Its double can
     * therefore differ from the correctly rounded entry only if a rounding midpoint lies within
     * 10^-26 relative of the exact value: then the two are neighbours, and the 60-digit value
     * (from apfloat) must be that close to their midpoint. Anything else is a wrong entry.
     */
    static void assertCommonsAgrees(int n, TableResult r, GaussIntegratorFactory factory) {
        GaussIntegrator g = factory.legendreHighPrecision(n);
        assertEquals(n, g.getNumberOfPoints());
        for (int i = 0; i < n; i++) {
            List<Entry> row = r.rows().get(i).entries();
            double[] commons = {g.getPoint(i), g.getWeight(i)};
            for (int c = 0; c < 2; c++) {
                double ours = Double.longBitsToDouble(row.get(c).bits().longValue());
                if (Double.doubleToRawLongBits(ours) == Double.doubleToRawLongBits(commons[c])) {
                    continue;
                }
                String what = "n = " + n + ", " + (c == 0 ? "node " : "weight ") + (i + 1);
                assertTrue(Math.nextUp(Math.min(ours, commons[c])) == Math.max(ours, commons[c]), what + ": not neighbours: "
                        + ours + " vs commons-math " + commons[c]);
                Apfloat[] xw = polished(n, new Apfloat(row.get(0).value().toBigDecimalExact(), P));
                BigDecimal exact = big(xw[c]);
                BigDecimal midpoint = new BigDecimal(ours).add(new BigDecimal(commons[c])).divide(BigDecimal.valueOf(2));
                BigDecimal distance = exact.subtract(midpoint).abs().divide(exact.abs(), MathContext.DECIMAL64);
                assertTrue(distance.compareTo(new BigDecimal("1e-26")) <= 0, what + ": commons-math differs by one ulp, but the exact value is "
                        + distance + " (relative) from the midpoint");
            }
        }
    }

    @Test
    void sampledRulesMatchApfloatAndCommonsMath() throws Exception {
        // commons-math builds every rule up to n on the way (each from the one before), so one
        // factory serves the rising n; beyond n = 20 it takes seconds: the full sweep is slow
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        for (int n : new int[] {5, 8, 13, 20}) {
            TableResult r = GaussRuleTest.rule(GaussRuleTest.LEGENDRE, n, GaussRuleTest.B64);
            assertApfloatAgrees(n, r);
            assertCommonsAgrees(n, r, factory);
        }
        for (int n : new int[] {64, 100}) {
            assertApfloatAgrees(n, GaussRuleTest.rule(GaussRuleTest.LEGENDRE, n, GaussRuleTest.B64));
        }
    }

    @Test
    @Tag("slow")
    void everyRuleFromFiveToTwoHundredMatchesApfloatAndCommonsMath() throws Exception {
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        for (int n = 5; n <= 200; n++) {
            TableResult r = GaussRuleTest.rule(GaussRuleTest.LEGENDRE, n, GaussRuleTest.B64);
            assertApfloatAgrees(n, r);
            assertCommonsAgrees(n, r, factory);
        }
    }
}
