package dev.odetab.expr;

import dev.odetab.base.ExprException;

import dev.odetab.expr.Syntax.Bin;
import dev.odetab.expr.Syntax.Call;
import dev.odetab.expr.Syntax.Group;
import dev.odetab.expr.Syntax.Name;
import dev.odetab.expr.Syntax.Neg;
import dev.odetab.expr.Syntax.Node;
import dev.odetab.expr.Syntax.Num;
import dev.odetab.numeric.Rational;
import java.util.Locale;
import java.util.Map;

/**
 * The meaning of a syntax tree: constants as {@link ConstExpr}, and expressions in x and y as
 * linear forms d2·y'' + d1·y' + d0·y + free with rational-function coefficients.
 *
 * <p>Trust level: Exact.
 */
final class Linear {
    /** Largest exponent accepted on a non-constant base. */
    static final int MAX_POWER = 256;

    /** d2·y'' + d1·y' + d0·y + free. */
    record Form(RationalFunction d2, RationalFunction d1, RationalFunction d0, RationalFunction free) {
        static Form constant(RationalFunction f) {
            return new Form(RationalFunction.ZERO, RationalFunction.ZERO, RationalFunction.ZERO, f);
        }

        boolean hasY() {
            return !d2.isZero() || !d1.isZero() || !d0.isZero();
        }

        Form add(Form o) {
            return new Form(d2.add(o.d2), d1.add(o.d1), d0.add(o.d0), free.add(o.free));
        }

        Form negate() {
            return new Form(d2.negate(), d1.negate(), d0.negate(), free.negate());
        }

        Form multiply(RationalFunction k) {
            return new Form(d2.multiply(k), d1.multiply(k), d0.multiply(k), free.multiply(k));
        }

        Form divide(RationalFunction k) {
            return new Form(d2.divide(k), d1.divide(k), d0.divide(k), free.divide(k));
        }
    }

    private final Map<String, Rational> params;
    /** Start of the "must be exact rationals" messages: names what the coefficients belong to. */
    private final String coefficients;

    /**
     * @param coefficients how messages name the coefficients, e.g. "coefficients of the equation"
     */
    Linear(Map<String, Rational> params, String coefficients) {
        this.params = params;
        this.coefficients = coefficients;
    }

    /** The constant expression of a tree without x and y (the parser has checked the names). */
    ConstExpr constant(Node n) {
        if (n instanceof Num m) {
            return new ConstExpr.Number(m.value(), m.column());
        } else if (n instanceof Name m) {
            if (m.name().equals("pi")) {
                return new ConstExpr.Pi(m.column());
            }
            Rational v = params.get(m.name());
            if (v == null) {
                throw new IllegalStateException("not a constant: " + m.name());
            }
            return new ConstExpr.Number(v, m.column());
        } else if (n instanceof Neg m) {
            return new ConstExpr.Negate(constant(m.operand()), m.column());
        } else if (n instanceof Group m) {
            return constant(m.inner());
        } else if (n instanceof Call m) {
            ConstExpr.Function f = ConstExpr.Function.valueOf(m.function().toUpperCase(Locale.ROOT));
            return new ConstExpr.Call(f, constant(m.argument()), m.column());
        }
        Bin b = (Bin) n;
        ConstExpr.Op op = switch (b.op()) {
            case '+' -> ConstExpr.Op.ADD;
            case '-' -> ConstExpr.Op.SUBTRACT;
            case '*' -> ConstExpr.Op.MULTIPLY;
            case '/' -> ConstExpr.Op.DIVIDE;
            default -> ConstExpr.Op.POWER;
        };
        return new ConstExpr.Binary(op, constant(b.left()), constant(b.right()), b.column());
    }

    static boolean hasVariable(Node n) {
        if (n instanceof Name m) {
            return m.name().equals("x") || m.name().startsWith("y");
        }
        return anyChild(n, Linear::hasVariable);
    }

    static boolean hasY(Node n) {
        if (n instanceof Name m) {
            return m.name().startsWith("y");
        }
        return anyChild(n, Linear::hasY);
    }

    private static boolean anyChild(Node n, java.util.function.Predicate<Node> p) {
        if (n instanceof Neg m) {
            return p.test(m.operand());
        } else if (n instanceof Bin m) {
            return p.test(m.left()) || p.test(m.right());
        } else if (n instanceof Call m) {
            return p.test(m.argument());
        } else if (n instanceof Group m) {
            return p.test(m.inner());
        }
        return false;
    }

    /** The linear form of a tree; rejects what is not linear in y or not rational in x. */
    Form form(Node n) throws ExprException {
        if (!hasVariable(n)) {
            return Form.constant(RationalFunction.constant(exactConstant(n)));
        }
        if (n instanceof Name m) {
            RationalFunction one = RationalFunction.ONE;
            RationalFunction zero = RationalFunction.ZERO;
            switch (m.name()) {
                case "x":
                    return Form.constant(RationalFunction.X);
                case "y":
                    return new Form(zero, zero, one, zero);
                case "y'":
                    return new Form(zero, one, zero, zero);
                default:
                    return new Form(one, zero, zero, zero);
            }
        } else if (n instanceof Group m) {
            return form(m.inner());
        } else if (n instanceof Neg m) {
            return form(m.operand()).negate();
        } else if (n instanceof Call m) {
            if (hasY(m.argument())) {
                throw new ExprException(m.column(), "the equation must be linear in y: y cannot appear inside '"
                        + m.function() + "'");
            }
            throw new ExprException(m.column(), coefficients + " must be rational functions of x; '"
                    + m.function() + "' is not allowed here");
        }
        Bin b = (Bin) n;
        switch (b.op()) {
            case '+':
                return form(b.left()).add(form(b.right()));
            case '-':
                return form(b.left()).add(form(b.right()).negate());
            case '*': {
                Form l = form(b.left());
                Form r = form(b.right());
                if (l.hasY() && r.hasY()) {
                    throw new ExprException(b.column(), "the equation must be linear in y: a product of two terms in y");
                }
                return l.hasY() ? l.multiply(r.free()) : r.multiply(l.free());
            }
            case '/': {
                Form l = form(b.left());
                Form r = form(b.right());
                if (r.hasY()) {
                    throw new ExprException(b.column(), "the equation must be linear in y: y cannot appear in a denominator");
                }
                if (r.free().isZero()) {
                    throw new ExprException(b.column(), "division by zero");
                }
                return l.divide(r.free());
            }
            default:
                return power(b);
        }
    }

    private Form power(Bin b) throws ExprException {
        if (hasY(b.left())) {
            throw new ExprException(b.column(), "the equation must be linear in y: a term in y cannot be raised to a power");
        }
        if (hasVariable(b.right())) {
            throw new ExprException(b.column(), "exponents must be constants");
        }
        ConstExpr e = constant(b.right());
        Rational k = ConstEval.exact(e);
        if (k == null || !k.isInteger() || k.signum() < 0) {
            throw new ExprException(b.column(), "powers of x must have a non-negative integer exponent, found "
                    + (k == null ? e.toString() : k.toString()));
        }
        if (k.compareTo(Rational.of(MAX_POWER)) > 0) {
            throw new ExprException(b.column(), "the exponent " + k + " is too large (at most " + MAX_POWER + ")");
        }
        return Form.constant(form(b.left()).free().pow(k.numerator().intValueExact()));
    }

    /** The exact value of a constant subtree, or an error naming the first part that is not rational. */
    Rational exactConstant(Node n) throws ExprException {
        ConstExpr c = constant(n);
        Rational r = ConstEval.exact(c);
        if (r != null) {
            return r;
        }
        ConstExpr culprit = culprit(c);
        String what = culprit instanceof ConstExpr.Pi ? "'pi' is not allowed here"
                : culprit instanceof ConstExpr.Call f ? "'" + f.function().sourceName() + "' is not allowed here"
                : "'" + culprit + "' is not rational";
        throw new ExprException(culprit.column(), coefficients + " must be exact rationals; " + what);
    }

    /** The leftmost innermost subexpression that is not exact although its operands are. */
    private static ConstExpr culprit(ConstExpr c) throws ExprException {
        ConstExpr[] children;
        if (c instanceof ConstExpr.Negate m) {
            children = new ConstExpr[] {m.operand()};
        } else if (c instanceof ConstExpr.Binary m) {
            children = new ConstExpr[] {m.left(), m.right()};
        } else if (c instanceof ConstExpr.Call m) {
            children = new ConstExpr[] {m.argument()};
        } else {
            return c;
        }
        for (ConstExpr child : children) {
            if (ConstEval.exact(child) == null) {
                return culprit(child);
            }
        }
        return c;
    }
}
