package dev.odetab.expr;

import dev.odetab.base.ExprException;

import dev.odetab.expr.ConstExpr.Binary;
import dev.odetab.expr.ConstExpr.Call;
import dev.odetab.expr.ConstExpr.Negate;
import dev.odetab.expr.ConstExpr.Number;
import dev.odetab.expr.ConstExpr.Op;
import dev.odetab.expr.ConstExpr.Pi;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.Rational;
import java.math.BigInteger;

/** Exact evaluation, ball evaluation and canonical printing of {@link ConstExpr} trees. */
final class ConstEval {
    /** Exact results beyond this many bits are refused rather than computed. */
    static final long MAX_EXACT_BITS = 1L << 20;
    /** gamma(n) is computed exactly as (n − 1)! up to this n. */
    static final int MAX_EXACT_GAMMA = 10_000;
    /** Extra bits for subexpressions, so that the combined radius stays near 2^-precBits. */
    private static final int GUARD_BITS = 10;

    private ConstEval() {
    }

    /**
     * Trust level: Exact. The value when rational by construction (see {@link ConstExpr#exact()}),
     * else null.
     *
     * @throws ExprException when exact operands make the value undefined (1/0, log(−1), gamma(0),
     *     (−8)^(1/3)) or too large to compute exactly
     */
    static Rational exact(ConstExpr e) throws ExprException {
        if (e instanceof Number n) {
            return n.value();
        } else if (e instanceof Pi) {
            return null;
        } else if (e instanceof Negate n) {
            Rational a = exact(n.operand());
            return a == null ? null : a.negate();
        } else if (e instanceof Binary b) {
            Rational l = exact(b.left());
            Rational r = exact(b.right());
            if (l == null || r == null) {
                return null;
            }
            switch (b.op()) {
                case ADD:
                    return l.add(r);
                case SUBTRACT:
                    return l.subtract(r);
                case MULTIPLY:
                    return l.multiply(r);
                case DIVIDE:
                    if (r.isZero()) {
                        throw new ExprException(b.column(), "division by zero");
                    }
                    return l.divide(r);
                default:
                    return power(l, r, b.column());
            }
        }
        Call c = (Call) e;
        Rational a = exact(c.argument());
        if (a == null) {
            return null;
        }
        switch (c.function()) {
            case SQRT:
                if (a.signum() < 0) {
                    throw new ExprException(c.column(), "sqrt is undefined at " + a + ": the argument must not be negative");
                }
                return root(a, 2);
            case EXP:
                return a.isZero() ? Rational.ONE : null;
            case LOG:
                if (a.signum() <= 0) {
                    throw new ExprException(c.column(), "log is undefined at " + a + ": the argument must be positive");
                }
                return a.equals(Rational.ONE) ? Rational.ZERO : null;
            default:
                if (a.isInteger() && a.signum() <= 0) {
                    throw new ExprException(c.column(), "gamma has a pole at " + a);
                }
                if (a.isInteger() && a.compareTo(Rational.of(MAX_EXACT_GAMMA)) <= 0) {
                    BigInteger f = BigInteger.ONE;
                    for (int k = 2; k < a.numerator().intValueExact(); k++) {
                        f = f.multiply(BigInteger.valueOf(k));
                    }
                    return Rational.of(f);
                }
                return null;
        }
    }

    /** base^(p/q) exactly, or null when it is irrational. */
    private static Rational power(Rational base, Rational exponent, int column) throws ExprException {
        if (base.isZero()) {
            if (exponent.signum() < 0) {
                throw new ExprException(column, "division by zero: 0 raised to a negative power");
            }
            return exponent.isZero() ? Rational.ONE : Rational.ZERO;
        }
        if (!exponent.isInteger() && base.signum() < 0) {
            throw new ExprException(column, "a negative base needs an integer exponent, found exponent " + exponent);
        }
        if (base.equals(Rational.ONE)) {
            return Rational.ONE;
        }
        BigInteger q = exponent.denominator();
        BigInteger p = exponent.numerator();
        long bits = Math.max(base.numerator().bitLength(), base.denominator().bitLength());
        if (p.abs().bitLength() > 31 || q.bitLength() > 31 || bits * p.abs().longValueExact() / q.longValueExact() > MAX_EXACT_BITS) {
            if (base.abs().equals(Rational.ONE) && exponent.isInteger()) {
                return p.testBit(0) ? base : Rational.ONE;
            }
            throw new ExprException(column, "the exact value of this power would exceed " + MAX_EXACT_BITS + " bits");
        }
        Rational r = root(base, q.intValueExact());
        return r == null ? null : r.pow(p.intValueExact());
    }

    /** The positive k-th root of a non-negative rational when it is rational, else null. */
    private static Rational root(Rational a, int k) {
        if (k == 1 || a.isZero()) {
            return a;
        }
        BigInteger n = integerRoot(a.numerator(), k);
        BigInteger d = integerRoot(a.denominator(), k);
        return n == null || d == null ? null : Rational.of(n, d);
    }

    /** The exact k-th root of n &gt;= 1, or null (Newton's iteration from above on integers). */
    static BigInteger integerRoot(BigInteger n, int k) {
        if (n.equals(BigInteger.ONE)) {
            return n;
        }
        if (k > n.bitLength()) {
            return null;
        }
        BigInteger kk = BigInteger.valueOf(k);
        BigInteger x = BigInteger.ONE.shiftLeft((n.bitLength() + k - 1) / k);
        while (true) {
            BigInteger y = kk.subtract(BigInteger.ONE).multiply(x).add(n.divide(x.pow(k - 1))).divide(kk);
            if (y.compareTo(x) >= 0) {
                break;
            }
            x = y;
        }
        return x.pow(k).equals(n) ? x : null;
    }

    /** Trust level: Rigorous. See {@link ConstExpr#evaluate(int)}. */
    static Ball ball(ConstExpr e, int precBits) throws ExprException {
        Rational q = exact(e);
        if (q != null) {
            return Ball.of(q, precBits);
        }
        int inner = precBits + GUARD_BITS;
        try {
            if (e instanceof Pi) {
                return BallFunctions.pi(precBits);
            } else if (e instanceof Negate n) {
                return ball(n.operand(), precBits).negate();
            } else if (e instanceof Binary b) {
                Ball l = ball(b.left(), inner);
                switch (b.op()) {
                    case ADD:
                        return l.add(ball(b.right(), inner), precBits);
                    case SUBTRACT:
                        return l.subtract(ball(b.right(), inner), precBits);
                    case MULTIPLY:
                        return l.multiply(ball(b.right(), inner), precBits);
                    case DIVIDE:
                        Ball r = ball(b.right(), inner);
                        if (r.containsZero()) {
                            throw new ExprException(b.column(), "division by a value that cannot be separated from zero at this precision");
                        }
                        return l.divide(r, precBits);
                    default:
                        Rational k = exact(b.right());
                        if (k == null) {
                            return BallFunctions.pow(l, ball(b.right(), inner), precBits);
                        }
                        if (k.isInteger() && k.numerator().bitLength() < 31) {
                            if (k.signum() < 0 && l.containsZero()) {
                                throw new ExprException(b.column(), "negative power of a value that cannot be separated from zero at this precision");
                            }
                            return l.pow(k.numerator().intValueExact(), precBits);
                        }
                        return BallFunctions.pow(l, k, precBits);
                }
            }
            Call c = (Call) e;
            Ball a = ball(c.argument(), inner);
            switch (c.function()) {
                case SQRT:
                    return BallFunctions.sqrt(a, precBits);
                case EXP:
                    return BallFunctions.exp(a, precBits);
                case LOG:
                    return BallFunctions.log(a, precBits);
                default:
                    return BallFunctions.gamma(a, precBits);
            }
        } catch (ArithmeticException ex) {
            String what = e instanceof Call c ? c.function().sourceName()
                    : e instanceof Binary b ? "'" + b.op().symbol() + "'" : "pi";
            throw new ExprException(e.column(), what + ": " + ex.getMessage());
        }
    }

    /** Binding strength, loosest first. */
    private static final int SUM = 1;
    private static final int PRODUCT = 2;
    private static final int NEGATION = 3;
    private static final int POWER = 4;
    private static final int ATOM = 5;

    /**
     * Canonical ordinary notation: spaces around binary + and −, none around * / ^, and the
     * fewest parentheses that make {@link ExprParser#parseConstant} read the same tree back
     * (a right operand that starts with '-' is parenthesized, except after '^').
     */
    static String format(ConstExpr e) {
        if (e instanceof Number n) {
            return n.value().toDecimalOrFraction();
        } else if (e instanceof Pi) {
            return "pi";
        } else if (e instanceof Negate n) {
            return "-" + wrap(format(n.operand()), precedence(n.operand()) < POWER);
        } else if (e instanceof Call c) {
            return c.function().sourceName() + "(" + format(c.argument()) + ")";
        }
        // Each operand is formatted once (formatting it again for the sign test made the
        // time grow as 2^depth on nested expressions).
        Binary b = (Binary) e;
        int lp = precedence(b.left());
        int rp = precedence(b.right());
        String left = format(b.left());
        String right = format(b.right());
        boolean rightNegative = right.startsWith("-");
        switch (b.op()) {
            case ADD:
            case SUBTRACT:
                return wrap(left, lp < SUM) + " " + b.op().symbol() + " " + wrap(right, rp <= SUM || rightNegative);
            case MULTIPLY:
            case DIVIDE:
                return wrap(left, lp < PRODUCT) + b.op().symbol() + wrap(right, rp <= PRODUCT || rightNegative);
            default:
                return wrap(left, lp <= POWER || left.startsWith("-")) + "^" + wrap(right, rp < NEGATION);
        }
    }

    private static String wrap(String formatted, boolean parens) {
        return parens ? "(" + formatted + ")" : formatted;
    }

    private static int precedence(ConstExpr e) {
        if (e instanceof Number n) {
            String s = format(n);
            return s.contains("/") ? PRODUCT : s.startsWith("-") ? NEGATION : ATOM;
        } else if (e instanceof Negate) {
            return NEGATION;
        } else if (e instanceof Binary b) {
            switch (b.op()) {
                case ADD:
                case SUBTRACT:
                    return SUM;
                case MULTIPLY:
                case DIVIDE:
                    return PRODUCT;
                default:
                    return POWER;
            }
        }
        return ATOM;
    }
}
