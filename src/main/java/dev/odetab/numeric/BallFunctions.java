package dev.odetab.numeric;

import ch.obermuhlner.math.big.BigDecimalMath;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.function.Function;

/**
 * Temporary stand-in for the rigorous elementary and gamma functions on balls, so that code
 * depending on this API compiles and runs before the real implementation is merged.
 *
 * <p>Trust level: Heuristic (not rigorous). Values come from big-math at a few guard digits
 * and the radius is a generous guess (relative 10^-digits10(precBits), plus the spread of the
 * function over the input ball, sampled at the endpoints). Only the signatures and the domain
 * errors (ArithmeticException with a message) match the real implementation.
 */
public final class BallFunctions {
    private static final int GUARD_DIGITS = 10;

    private BallFunctions() {
    }

    /** Encloses pi (heuristic radius). */
    public static Ball pi(int precBits) {
        return around(BigDecimalMath.pi(working(precBits)), precBits);
    }

    /** Encloses sqrt over the ball; throws when the ball reaches below zero. */
    public static Ball sqrt(Ball x, int precBits) {
        if (x.lower().signum() < 0) {
            throw new ArithmeticException("sqrt of a ball that reaches below zero: " + x);
        }
        return monotone(x, v -> BigDecimalMath.sqrt(v, working(precBits)), precBits);
    }

    /** Encloses exp over the ball. */
    public static Ball exp(Ball x, int precBits) {
        return monotone(x, v -> BigDecimalMath.exp(v, working(precBits)), precBits);
    }

    /** Encloses log over the ball; throws when the ball is not strictly positive. */
    public static Ball log(Ball x, int precBits) {
        if (x.lower().signum() <= 0) {
            throw new ArithmeticException("log of a ball that is not strictly positive: " + x);
        }
        return monotone(x, v -> BigDecimalMath.log(v, working(precBits)), precBits);
    }

    /** Encloses base^exponent; a non-integer exponent needs a positive base (or an exact zero base and a positive exponent). */
    public static Ball pow(Ball base, Rational exponent, int precBits) {
        if (exponent.isInteger()) {
            int k = exponent.numerator().intValueExact();
            if (k < 0 && base.containsZero()) {
                throw new ArithmeticException("negative power of a ball that contains zero: " + base);
            }
            return base.pow(k, precBits);
        }
        if (base.isExact() && base.mid().signum() == 0 && exponent.signum() > 0) {
            return Ball.ZERO;
        }
        if (base.lower().signum() <= 0) {
            throw new ArithmeticException("non-integer power of a ball that is not strictly positive: " + base);
        }
        BigDecimal e = exponent.toBigDecimal(working(precBits));
        return monotone(base, v -> BigDecimalMath.pow(v, e, working(precBits)), precBits);
    }

    /** Encloses base^exponent for a strictly positive base. */
    public static Ball pow(Ball base, Ball exponent, int precBits) {
        if (base.lower().signum() <= 0) {
            throw new ArithmeticException("power of a ball that is not strictly positive: " + base);
        }
        return exp(log(base, precBits).multiply(exponent, precBits), precBits);
    }

    /** Encloses gamma over the ball; throws when the ball contains a pole (a non-positive integer). */
    public static Ball gamma(Ball x, int precBits) {
        BigDecimal lo = x.lower();
        BigDecimal hi = x.upper();
        if (lo.signum() <= 0) {
            BigDecimal pole = hi.setScale(0, RoundingMode.FLOOR).min(BigDecimal.ZERO);
            if (pole.compareTo(lo) >= 0) {
                throw new ArithmeticException("gamma has a pole at " + pole.toPlainString() + " inside " + x);
            }
        }
        return monotone(x, v -> BigDecimalMath.gamma(v, working(precBits)), precBits);
    }

    private static MathContext working(int precBits) {
        return new MathContext(Precision.digits10(precBits) + GUARD_DIGITS, RoundingMode.HALF_EVEN);
    }

    private static Ball monotone(Ball x, Function<BigDecimal, BigDecimal> f, int precBits) {
        Ball r = around(f.apply(x.mid()), precBits);
        if (!x.isExact()) {
            r = r.union(around(f.apply(x.lower()), precBits)).union(around(f.apply(x.upper()), precBits));
        }
        return r;
    }

    private static Ball around(BigDecimal value, int precBits) {
        BigDecimal rel = BigDecimal.ONE.scaleByPowerOfTen(-Precision.digits10(precBits));
        BigDecimal rad = value.abs().multiply(rel).add(rel.multiply(rel));
        return Ball.of(value.round(Precision.midpoint(precBits)), rad.add(value.subtract(value.round(Precision.midpoint(precBits))).abs()));
    }
}
