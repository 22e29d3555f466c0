package dev.odetab.series;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Directed;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.math.BigDecimal;
import java.math.BigInteger;

/**
 * The recurrence of the Taylor coefficients of every solution at an ordinary point alpha.
 *
 * <p>Trust level: Exact. With P2(alpha+t) = Σ a_i t^i, P1(alpha+t) = Σ b_i t^i and
 * P0(alpha+t) = Σ d_i t^i (exact Taylor shifts), y = Σ c_m t^m solves the equation iff for
 * m &gt;= 2 (docs/methods.md §1, collecting t^(m−2)):
 * <pre>
 *   c_m = Σ_{j=1..J} beta_j(m) c_{m−j},
 *   beta_j(m) = −[a_j (m−j)(m−j−1) + b_{j−1} (m−j) + d_{j−2}] / (a_0 m (m−1)),
 * </pre>
 * J = max(deg P2, deg P1 + 1, deg P0 + 2). The shifted coefficients are scaled by one common
 * positive integer so that they are integers {@code A_i, B_i, D_i}; then
 * beta_j(m) = num_j(m) / den(m) with integer num_j(m) = −[A_j (m−j)(m−j−1) + B_{j−1}(m−j)
 * + D_{j−2}] and den(m) = A_0 m (m−1), which keeps the summation to integer products.
 */
public final class Recurrence {
    private final Rational center;
    private final int order;
    private final BigInteger[] a;
    private final BigInteger[] b;
    private final BigInteger[] d;
    private final Rational[] aOverA0;
    private final Rational[] bOverA0;
    private final Rational[] dOverA0;

    /**
     * @param equation the equation (any form; the reduced form is used)
     * @param center an ordinary point
     * @throws IllegalArgumentException when {@code center} is a singular point
     */
    public Recurrence(Equation equation, Rational center) {
        Equation eq = equation.reduced();
        if (eq.p2().evaluate(center).isZero()) {
            throw new IllegalArgumentException("x = " + center.toDecimalOrFraction() + " is a singular point of " + equation);
        }
        this.center = center;
        Poly p2 = eq.p2().taylorShift(center);
        Poly p1 = eq.p1().taylorShift(center);
        Poly p0 = eq.p0().taylorShift(center);
        this.order = Math.max(p2.degree(), Math.max(p1.degree() + 1, p0.degree() + 2));
        BigInteger lcm = BigInteger.ONE;
        for (Poly p : new Poly[] {p2, p1, p0}) {
            for (Rational r : p.coefficients()) {
                BigInteger den = r.denominator();
                lcm = lcm.divide(lcm.gcd(den)).multiply(den);
            }
        }
        Rational scale = Rational.of(lcm);
        if (p2.coefficient(0).signum() < 0) {
            scale = scale.negate();
        }
        a = integers(p2, scale, order + 1);
        b = integers(p1, scale, order + 1);
        d = integers(p0, scale, order + 1);
        Rational a0 = p2.coefficient(0);
        aOverA0 = new Rational[order + 1];
        bOverA0 = new Rational[order + 1];
        dOverA0 = new Rational[order + 1];
        for (int i = 0; i <= order; i++) {
            aOverA0[i] = p2.coefficient(i).divide(a0).abs();
            bOverA0[i] = p1.coefficient(i).divide(a0).abs();
            dOverA0[i] = p0.coefficient(i).divide(a0).abs();
        }
    }

    private static BigInteger[] integers(Poly p, Rational scale, int n) {
        BigInteger[] r = new BigInteger[n];
        for (int i = 0; i < n; i++) {
            Rational v = p.coefficient(i).multiply(scale);
            r[i] = v.numerator();
        }
        return r;
    }

    public Rational center() {
        return center;
    }

    /** J: how many earlier coefficients each new one depends on. */
    public int order() {
        return order;
    }

    /** num_j(m), the integer numerator of beta_j(m); 1 &lt;= j &lt;= J, m &gt;= 2. */
    public BigInteger numerator(int j, int m) {
        BigInteger s = a[j].multiply(BigInteger.valueOf((long) (m - j) * (m - j - 1)));
        if (j >= 1) {
            s = s.add(b[j - 1].multiply(BigInteger.valueOf(m - j)));
        }
        if (j >= 2) {
            s = s.add(d[j - 2]);
        }
        return s.negate();
    }

    /** den(m) = A_0 m (m−1) &gt; 0, the common denominator of beta_j(m). */
    public BigInteger denominator(int m) {
        return a[0].multiply(BigInteger.valueOf((long) m * (m - 1)));
    }

    /** beta_j(m) exactly. */
    public Rational beta(int j, int m) {
        return Rational.of(numerator(j, m), denominator(m));
    }

    /**
     * B_j(M) of docs/methods.md §2, rounded up: |a_j/a_0| + |b_{j−1}|/(|a_0|(M−1)) + |d_{j−2}|/(|a_0| M(M−1)).
     * For m &gt;= M &gt; J, |beta_j(m)| &lt;= B_j(M) because 0 &lt; (m−j)(m−j−1) &lt; m(m−1),
     * (m−j)/(m(m−1)) &lt;= 1/(m−1) &lt;= 1/(M−1) and 1/(m(m−1)) &lt;= 1/(M(M−1)).
     */
    public BigDecimal betaBound(int j, int bigM) {
        if (bigM <= order) {
            throw new IllegalArgumentException("B_j(M) needs M > J = " + order + ", got " + bigM);
        }
        Rational s = aOverA0[j];
        if (j >= 1) {
            s = s.add(bOverA0[j - 1].divide(Rational.of(bigM - 1)));
        }
        if (j >= 2) {
            s = s.add(dOverA0[j - 2].divide(Rational.of((long) bigM * (bigM - 1))));
        }
        return Directed.absUp(s);
    }

    /** |a_j / a_0| exactly: the limit of B_j(M) for large M (the Cauchy-type disk of docs/methods.md §2). */
    public Rational leadingRatio(int j) {
        return aOverA0[j];
    }

    /** Human-readable form of the recurrence, for {@code inspect}. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        sb.append("c(m) = ");
        boolean first = true;
        for (int j = 1; j <= order; j++) {
            // num_j(m) as a polynomial in m: −[A_j (m−j)(m−j−1) + B_{j−1}(m−j) + D_{j−2}]
            Poly mj = Poly.of(Rational.of(-j), Rational.ONE);
            Poly numer = mj.multiply(Poly.of(Rational.of(-j - 1), Rational.ONE)).scale(Rational.of(a[j]));
            numer = numer.add(mj.scale(Rational.of(b[j - 1])));
            if (j >= 2) {
                numer = numer.add(Poly.constant(Rational.of(d[j - 2])));
            }
            numer = numer.negate();
            if (numer.isZero()) {
                continue;
            }
            sb.append(first ? "" : " + ").append("[").append(numer.toString("m")).append("]*c(m-").append(j).append(")");
            first = false;
        }
        if (first) {
            sb.append("0");
        }
        sb.append("  /  [").append(Poly.of(Rational.ZERO, Rational.of(a[0]).negate(), Rational.of(a[0])).toString("m")).append("]");
        return sb.toString();
    }
}
