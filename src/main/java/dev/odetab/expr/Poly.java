package dev.odetab.expr;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A polynomial in one variable with exact rational coefficients, immutable.
 *
 * <p>Trust level: Exact. Every operation (arithmetic, division with remainder, gcd, Taylor
 * shift, evaluation at a rational) is exact. Evaluation at a {@link Ball} is rigorous (Horner
 * in ball arithmetic).
 */
public final class Poly {
    public static final Poly ZERO = new Poly(new Rational[0]);
    public static final Poly ONE = constant(Rational.ONE);
    /** The variable itself. */
    public static final Poly X = new Poly(new Rational[] {Rational.ZERO, Rational.ONE});

    /** coefficients, lowest degree first, no trailing zeros. */
    private final Rational[] c;

    private Poly(Rational[] coefficients) {
        int n = coefficients.length;
        while (n > 0 && coefficients[n - 1].isZero()) {
            n--;
        }
        this.c = n == coefficients.length ? coefficients : Arrays.copyOf(coefficients, n);
    }

    /** The polynomial Σ coefficients[i] x^i. */
    public static Poly of(List<Rational> coefficients) {
        return new Poly(coefficients.toArray(new Rational[0]));
    }

    public static Poly of(Rational... coefficients) {
        return new Poly(coefficients.clone());
    }

    public static Poly constant(Rational value) {
        return new Poly(new Rational[] {value});
    }

    /** Degree; −1 for the zero polynomial. */
    public int degree() {
        return c.length - 1;
    }

    public boolean isZero() {
        return c.length == 0;
    }

    public boolean isConstant() {
        return c.length <= 1;
    }

    /** Coefficient of x^i (zero beyond the degree). */
    public Rational coefficient(int i) {
        return i >= 0 && i < c.length ? c[i] : Rational.ZERO;
    }

    public Rational leadingCoefficient() {
        return c.length == 0 ? Rational.ZERO : c[c.length - 1];
    }

    public List<Rational> coefficients() {
        return List.of(c);
    }

    public Poly add(Poly o) {
        Rational[] r = new Rational[Math.max(c.length, o.c.length)];
        for (int i = 0; i < r.length; i++) {
            r[i] = coefficient(i).add(o.coefficient(i));
        }
        return new Poly(r);
    }

    public Poly subtract(Poly o) {
        return add(o.negate());
    }

    public Poly negate() {
        return scale(Rational.ONE.negate());
    }

    public Poly scale(Rational k) {
        if (k.isZero()) {
            return ZERO;
        }
        Rational[] r = new Rational[c.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = c[i].multiply(k);
        }
        return new Poly(r);
    }

    public Poly multiply(Poly o) {
        if (isZero() || o.isZero()) {
            return ZERO;
        }
        Rational[] r = new Rational[c.length + o.c.length - 1];
        Arrays.fill(r, Rational.ZERO);
        for (int i = 0; i < c.length; i++) {
            if (c[i].isZero()) {
                continue;
            }
            for (int j = 0; j < o.c.length; j++) {
                r[i + j] = r[i + j].add(c[i].multiply(o.c[j]));
            }
        }
        return new Poly(r);
    }

    public Poly pow(int k) {
        Poly r = ONE;
        for (int i = 0; i < k; i++) {
            r = r.multiply(this);
        }
        return r;
    }

    public Poly derivative() {
        if (c.length <= 1) {
            return ZERO;
        }
        Rational[] r = new Rational[c.length - 1];
        for (int i = 1; i < c.length; i++) {
            r[i - 1] = c[i].multiply(i);
        }
        return new Poly(r);
    }

    /** Quotient and remainder of division by a non-zero polynomial: this = q·d + r, deg r &lt; deg d. */
    public Poly[] divideAndRemainder(Poly d) {
        if (d.isZero()) {
            throw new ArithmeticException("polynomial division by zero");
        }
        Rational[] rem = c.clone();
        int dd = d.degree();
        int qd = degree() - dd;
        if (qd < 0) {
            return new Poly[] {ZERO, this};
        }
        Rational[] q = new Rational[qd + 1];
        Rational lead = d.leadingCoefficient();
        for (int k = qd; k >= 0; k--) {
            Rational f = rem[k + dd].divide(lead);
            q[k] = f;
            if (f.isZero()) {
                continue;
            }
            for (int j = 0; j <= dd; j++) {
                rem[k + j] = rem[k + j].subtract(f.multiply(d.c[j]));
            }
        }
        return new Poly[] {new Poly(q), new Poly(Arrays.copyOf(rem, Math.max(dd, 0)))};
    }

    /** Exact quotient; throws when {@code d} does not divide this polynomial. */
    public Poly divideExact(Poly d) {
        Poly[] qr = divideAndRemainder(d);
        if (!qr[1].isZero()) {
            throw new ArithmeticException("not divisible: (" + this + ") / (" + d + ")");
        }
        return qr[0];
    }

    /** Monic greatest common divisor; gcd(0, 0) = 0. */
    public Poly gcd(Poly o) {
        Poly a = this;
        Poly b = o;
        while (!b.isZero()) {
            Poly r = a.divideAndRemainder(b)[1];
            a = b;
            b = r.primitivePart();
        }
        return a.monic();
    }

    /** This polynomial divided by its leading coefficient (zero stays zero). */
    public Poly monic() {
        return isZero() ? this : scale(leadingCoefficient().reciprocal());
    }

    /** A positive rational multiple with coprime integer coefficients (keeps gcd cheap). */
    public Poly primitivePart() {
        if (isZero()) {
            return this;
        }
        BigInteger lcm = BigInteger.ONE;
        for (Rational r : c) {
            BigInteger d = r.denominator();
            lcm = lcm.divide(lcm.gcd(d)).multiply(d);
        }
        BigInteger g = BigInteger.ZERO;
        for (Rational r : c) {
            g = g.gcd(r.numerator().multiply(lcm.divide(r.denominator())));
        }
        return scale(Rational.of(lcm, g));
    }

    /** Exact value at a rational point (Horner). */
    public Rational evaluate(Rational x) {
        if (c.length == 0) {
            return Rational.ZERO;
        }
        // With integer C_i = L c_i and x = p/q: p(x) = (Σ C_i p^i q^(n−i)) / (L q^n), by
        // homogeneous Horner in integers and one reduction at the end.
        BigInteger[] big = integerCoefficients();
        BigInteger p = x.numerator();
        BigInteger q = x.denominator();
        int n = c.length - 1;
        BigInteger acc = big[n];
        BigInteger qPower = BigInteger.ONE;
        for (int i = n - 1; i >= 0; i--) {
            qPower = qPower.multiply(q);
            acc = acc.multiply(p);
            if (big[i].signum() != 0) {
                acc = acc.add(big[i].multiply(qPower));
            }
        }
        return Rational.of(acc, big[n + 1].multiply(qPower));
    }

    /** L c_0 … L c_n and then L, the least common multiple of the denominators (computed once). */
    private BigInteger[] integerCoefficients() {
        BigInteger[] known = integers;
        if (known != null) {
            return known;
        }
        BigInteger lcm = BigInteger.ONE;
        for (Rational r : c) {
            BigInteger den = r.denominator();
            lcm = lcm.divide(lcm.gcd(den)).multiply(den);
        }
        BigInteger[] r = new BigInteger[c.length + 1];
        for (int i = 0; i < c.length; i++) {
            r[i] = c[i].numerator().multiply(lcm.divide(c[i].denominator()));
        }
        r[c.length] = lcm;
        integers = r;
        return r;
    }

    /** Cache for {@link #evaluate(Rational)}; a benign race (every thread computes the same array). */
    private volatile BigInteger[] integers;

    /** Enclosure of the value at every point of a ball (Horner in ball arithmetic). */
    public Ball evaluate(Ball x, int precBits) {
        Ball r = Ball.ZERO;
        for (int i = c.length - 1; i >= 0; i--) {
            r = r.multiply(x, precBits).add(Ball.of(c[i], precBits), precBits);
        }
        return r;
    }

    /** The polynomial q(t) = p(alpha + t), exactly (repeated synthetic division). */
    public Poly taylorShift(Rational alpha) {
        Rational[] a = c.clone();
        int n = a.length;
        for (int i = 0; i < n; i++) {
            for (int j = n - 2; j >= i; j--) {
                a[j] = a[j].add(alpha.multiply(a[j + 1]));
            }
        }
        return new Poly(a);
    }

    /** Order of vanishing at a rational point: the largest k with (x − alpha)^k dividing this; −1 for zero. */
    public int orderAt(Rational alpha) {
        if (isZero()) {
            return -1;
        }
        Poly s = taylorShift(alpha);
        int k = 0;
        while (s.coefficient(k).isZero()) {
            k++;
        }
        return k;
    }

    /**
     * Number of distinct real roots in the closed interval [a, b], a &lt;= b, by Sturm's theorem
     * on the square-free part (exact: every sign is taken at a rational point). Zero for the
     * zero polynomial's undefined case is not allowed: the polynomial must be non-zero.
     */
    public int countRealRoots(Rational a, Rational b) {
        if (isZero()) {
            throw new ArithmeticException("the zero polynomial vanishes everywhere");
        }
        if (degree() == 0) {
            return 0;
        }
        Poly f = divideExact(gcd(derivative()));
        List<Poly> chain = new ArrayList<>();
        chain.add(f);
        chain.add(f.derivative());
        while (!chain.get(chain.size() - 1).isZero()) {
            Poly r = chain.get(chain.size() - 2).divideAndRemainder(chain.get(chain.size() - 1))[1].negate();
            chain.add(r);
        }
        chain.remove(chain.size() - 1);
        int count = signChanges(chain, a) - signChanges(chain, b);
        return count + (f.evaluate(a).isZero() ? 1 : 0);
    }

    private static int signChanges(List<Poly> chain, Rational x) {
        int changes = 0;
        int last = 0;
        for (Poly p : chain) {
            int s = p.evaluate(x).signum();
            if (s != 0) {
                if (last != 0 && s != last) {
                    changes++;
                }
                last = s;
            }
        }
        return changes;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Poly p && Arrays.equals(c, p.c);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(c);
    }

    /** Ordinary notation in x, highest degree first: {@code x^2 - 2*x + 1/3}. */
    @Override
    public String toString() {
        return toString("x");
    }

    /** Ordinary notation in the named variable. */
    public String toString(String var) {
        if (isZero()) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        for (int i = c.length - 1; i >= 0; i--) {
            Rational k = c[i];
            if (k.isZero()) {
                continue;
            }
            boolean neg = k.signum() < 0;
            Rational a = k.abs();
            String mono = i == 0 ? "" : (i == 1 ? var : var + "^" + i);
            String coef = a.toString();
            String term;
            if (mono.isEmpty()) {
                term = coef;
            } else if (a.equals(Rational.ONE)) {
                term = mono;
            } else {
                term = (a.isInteger() ? coef : "(" + coef + ")") + "*" + mono;
            }
            if (sb.length() == 0) {
                sb.append(neg ? "-" : "").append(term);
            } else {
                sb.append(neg ? " - " : " + ").append(term);
            }
        }
        return sb.toString();
    }
}
