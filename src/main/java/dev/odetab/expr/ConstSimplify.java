package dev.odetab.expr;

import dev.odetab.expr.ConstExpr.Binary;
import dev.odetab.expr.ConstExpr.Call;
import dev.odetab.expr.ConstExpr.Negate;
import dev.odetab.expr.ConstExpr.Number;
import dev.odetab.expr.ConstExpr.Op;
import dev.odetab.numeric.Rational;
import java.util.Optional;

/**
 * The shortest reading of a constant for people: what provenance and {@code inspect} print.
 *
 * <p>Trust level: Exact. The result has the same value as the input: every subexpression that
 * {@link ConstExpr#exact()} proves rational becomes that rational ({@code 2^(-1/2/2 + 1/4)} is
 * 1), and the identities 1·x = x·1 = x/1 = x^1 = x, 0 + x = x + 0 = x − 0 = x, 0 − x = −x,
 * 0·x = x·0 = 0 and 0/x = 0 are applied. The last two hold only where x is defined and, for 0/x,
 * non-zero: callers simplify constants whose value has already been evaluated (a family's or
 * a spec's normalization), never to decide whether a value exists.
 */
public final class ConstSimplify {
    private ConstSimplify() {
    }

    /** The simplified expression (the same object when nothing simplifies). */
    public static ConstExpr of(ConstExpr e) {
        if (e instanceof Number) {
            return e;
        }
        Optional<Rational> exact = e.exact();
        if (exact.isPresent()) {
            return new Number(exact.get(), e.column());
        }
        if (e instanceof Negate n) {
            ConstExpr operand = of(n.operand());
            return operand == n.operand() ? n : new Negate(operand, n.column());
        }
        if (e instanceof Call c) {
            ConstExpr argument = of(c.argument());
            return argument == c.argument() ? c : new Call(c.function(), argument, c.column());
        }
        if (e instanceof Binary b) {
            return binary(b, of(b.left()), of(b.right()));
        }
        return e;
    }

    private static ConstExpr binary(Binary b, ConstExpr left, ConstExpr right) {
        boolean leftZero = is(left, Rational.ZERO);
        boolean rightZero = is(right, Rational.ZERO);
        boolean leftOne = is(left, Rational.ONE);
        boolean rightOne = is(right, Rational.ONE);
        Op op = b.op();
        if (op == Op.MULTIPLY && (leftZero || rightZero) || op == Op.DIVIDE && leftZero) {
            return new Number(Rational.ZERO, b.column());
        }
        if (op == Op.MULTIPLY && leftOne || op == Op.ADD && leftZero) {
            return right;
        }
        if ((op == Op.MULTIPLY || op == Op.DIVIDE || op == Op.POWER) && rightOne || (op == Op.ADD || op == Op.SUBTRACT) && rightZero) {
            return left;
        }
        if (op == Op.SUBTRACT && leftZero) {
            return new Negate(right, b.column());
        }
        return left == b.left() && right == b.right() ? b : new Binary(op, left, right, b.column());
    }

    private static boolean is(ConstExpr e, Rational value) {
        return e instanceof Number n && n.value().equals(value);
    }
}
