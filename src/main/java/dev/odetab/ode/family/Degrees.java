package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import java.math.BigInteger;

/** Checks and exact constants shared by families whose parameter is an integer degree. */
final class Degrees {
    /** The largest degree of the polynomial families. */
    static final int MAX_DEGREE = 1000;

    private Degrees() {
    }

    /** The degree parameter shared by the polynomial families. */
    static final Family.Parameter DEGREE = new Family.Parameter("n", "degree", "an integer 0 <= n <= " + MAX_DEGREE);

    /** The degree n from the parameter values, checked against 0 <= n <= MAX_DEGREE. */
    static int degree(java.util.Map<String, Rational> values) throws ParameterException {
        return integer("n", values.get("n"), 0, MAX_DEGREE);
    }

    static int integer(String name, Rational value, int min, int max) throws ParameterException {
        if (value == null) {
            throw new ParameterException(name, "missing parameter " + name + " (an integer " + min + " <= " + name + " <= " + max + ")");
        }
        if (!value.isInteger() || value.compareTo(Rational.of(min)) < 0 || value.compareTo(Rational.of(max)) > 0) {
            throw new ParameterException(name, name + " = " + value.toDecimalOrFraction() + " is outside the allowed range: an integer "
                    + min + " <= " + name + " <= " + max);
        }
        return value.numerator().intValueExact();
    }

    /**
     * A rational parameter with {@code lower < value <= upper}; {@code null} gives {@code fallback}
     * (or an error when there is none). {@code range} is the allowed range in words.
     */
    static Rational above(String name, Rational value, Rational lower, Rational upper, Rational fallback, String range)
            throws ParameterException {
        if (value == null) {
            if (fallback != null) {
                return fallback;
            }
            throw new ParameterException(name, "missing parameter " + name + " (" + range + ")");
        }
        if (value.compareTo(lower) <= 0 || value.compareTo(upper) > 0) {
            throw new ParameterException(name, name + " = " + value.toDecimalOrFraction() + " is outside the allowed range: " + range);
        }
        return value;
    }

    /** The Pochhammer symbol (a)_k = a (a + 1) … (a + k − 1), exactly (DLMF 5.2.4); one reduction at the end. */
    static Rational pochhammer(Rational a, int k) {
        BigInteger num = BigInteger.ONE;
        BigInteger den = BigInteger.ONE;
        for (int i = 0; i < k; i++) {
            Rational f = a.add(Rational.of(i));
            num = num.multiply(f.numerator());
            den = den.multiply(f.denominator());
        }
        return Rational.of(num, den);
    }

    /** k!, exactly. */
    static Rational factorial(int k) {
        return pochhammer(Rational.ONE, k);
    }

    /** (−1)^k. */
    static int sign(int k) {
        return k % 2 == 0 ? 1 : -1;
    }
}
