package dev.odetab.expr;

import dev.odetab.numeric.Rational;

/**
 * A rational function N(x)/D(x) with exact rational coefficients, immutable.
 *
 * <p>Trust level: Exact. Invariant: gcd(N, D) = 1, D is monic, and zero is 0/1; so two equal
 * functions have equal numerators and denominators, and {@link #equals} is mathematical
 * equality. Every operation is exact.
 */
public final class RationalFunction {
    public static final RationalFunction ZERO = new RationalFunction(Poly.ZERO, Poly.ONE);
    public static final RationalFunction ONE = new RationalFunction(Poly.ONE, Poly.ONE);
    /** The variable x. */
    public static final RationalFunction X = new RationalFunction(Poly.X, Poly.ONE);

    private final Poly num;
    private final Poly den;

    private RationalFunction(Poly num, Poly den) {
        this.num = num;
        this.den = den;
    }

    /** The polynomial p as a rational function. */
    public static RationalFunction of(Poly p) {
        return new RationalFunction(p, Poly.ONE);
    }

    /** The constant c. */
    public static RationalFunction constant(Rational c) {
        return of(Poly.constant(c));
    }

    /**
     * num/den in normal form.
     *
     * @throws ArithmeticException when {@code den} is the zero polynomial
     */
    public static RationalFunction of(Poly num, Poly den) {
        if (den.isZero()) {
            throw new ArithmeticException("division by zero");
        }
        if (num.isZero()) {
            return ZERO;
        }
        Poly g = num.gcd(den);
        Poly n = num.divideExact(g);
        Poly d = den.divideExact(g);
        Rational lead = d.leadingCoefficient().reciprocal();
        return new RationalFunction(n.scale(lead), d.scale(lead));
    }

    /** The numerator N, coprime to the denominator. */
    public Poly numerator() {
        return num;
    }

    /** The denominator D, monic. */
    public Poly denominator() {
        return den;
    }

    public boolean isZero() {
        return num.isZero();
    }

    /** True when the denominator is 1. */
    public boolean isPolynomial() {
        return den.degree() == 0;
    }

    /** True when this is a constant (a polynomial of degree at most 0). */
    public boolean isConstant() {
        return isPolynomial() && num.isConstant();
    }

    public RationalFunction add(RationalFunction o) {
        if (den.equals(o.den)) {
            return of(num.add(o.num), den);
        }
        return of(num.multiply(o.den).add(o.num.multiply(den)), den.multiply(o.den));
    }

    public RationalFunction subtract(RationalFunction o) {
        return add(o.negate());
    }

    public RationalFunction negate() {
        return new RationalFunction(num.negate(), den);
    }

    public RationalFunction multiply(RationalFunction o) {
        return of(num.multiply(o.num), den.multiply(o.den));
    }

    /**
     * The quotient.
     *
     * @throws ArithmeticException when {@code o} is zero
     */
    public RationalFunction divide(RationalFunction o) {
        if (o.isZero()) {
            throw new ArithmeticException("division by zero");
        }
        return of(num.multiply(o.den), den.multiply(o.num));
    }

    /**
     * this^k for any integer k; k &lt; 0 needs a non-zero function, and 0^0 = 1.
     *
     * @throws ArithmeticException for a negative power of zero
     */
    public RationalFunction pow(int k) {
        if (k < 0) {
            return ONE.divide(this).pow(-k);
        }
        return new RationalFunction(num.pow(k), den.pow(k));
    }

    /**
     * The exact value at x.
     *
     * @throws ArithmeticException when x is a pole (a root of the denominator)
     */
    public Rational evaluate(Rational x) {
        return num.evaluate(x).divide(den.evaluate(x));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RationalFunction r && num.equals(r.num) && den.equals(r.den);
    }

    @Override
    public int hashCode() {
        return num.hashCode() * 31 + den.hashCode();
    }

    /** Ordinary notation: {@code x^2 - 1}, or {@code (x + 1)/(x^2 + 4)}. */
    @Override
    public String toString() {
        if (isPolynomial()) {
            return num.toString();
        }
        String n = num.toString();
        boolean nSingle = n.matches("[^ ]*") && !n.contains("/");
        String d = den.toString();
        boolean dSingle = d.matches("[^ *]*") && !d.contains("/");
        return (nSingle ? n : "(" + n + ")") + "/" + (dSingle ? d : "(" + d + ")");
    }
}
