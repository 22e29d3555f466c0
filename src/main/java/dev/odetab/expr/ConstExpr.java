package dev.odetab.expr;

import dev.odetab.base.ExprException;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import java.util.Optional;

/**
 * A constant real expression: rationals, {@code + - * / ^}, pi, sqrt, exp, log and gamma.
 * Build one with {@link ExprParser#parseConstant}; every node keeps the 1-based column of
 * its operator or name in the parsed text, so that domain errors can point at it.
 *
 * <p>Trust level: Exact for {@link #exact()}, Rigorous for {@link #evaluate(int)}.
 */
public sealed interface ConstExpr {
    /** The 1-based column of this node's operator, function name or first character. */
    int column();

    /**
     * The exact value when it is rational by construction: numbers, + − × ÷ of exact operands,
     * integer powers, p^(a/b) when p is the b-th power of a rational (4^(1/2) = 2, 8^(2/3) = 4,
     * sqrt(9/4) = 3/2), exp(0) = 1, log(1) = 0 and gamma(n) = (n − 1)! for integers
     * 1 &lt;= n &lt;= 10000. Empty otherwise, which means "not known to be rational" (pi is
     * irrational, and so are p^(a/b), sqrt, exp and log of exact operands that miss the cases
     * above), and also when the value is undefined (1/0; {@link ExprParser} never returns
     * such a tree).
     */
    default Optional<Rational> exact() {
        try {
            return Optional.ofNullable(ConstEval.exact(this));
        } catch (ExprException e) {
            return Optional.empty();
        }
    }

    /**
     * A ball that contains the value: an exact rational is computed exactly and rounded once
     * ({@link Ball#of(Rational, int)}); otherwise subexpressions are evaluated with a few
     * guard bits and combined in ball arithmetic and {@link dev.odetab.numeric.BallFunctions}.
     * The radius aims at about 2^-precBits relative but is only guaranteed to be an
     * enclosure; a caller that needs more accuracy asks again with more bits.
     *
     * @throws ExprException at the column of the offending operator or function when the value
     *     is undefined (log of a non-positive number, a pole of gamma, division by zero) or
     *     cannot be decided at this precision (division by a ball that contains zero)
     */
    default Ball evaluate(int precBits) throws ExprException {
        return ConstEval.ball(this, precBits);
    }

    /** The operators of {@link Binary}, with their source symbol. */
    enum Op {
        ADD('+'), SUBTRACT('-'), MULTIPLY('*'), DIVIDE('/'), POWER('^');

        private final char symbol;

        Op(char symbol) {
            this.symbol = symbol;
        }

        public char symbol() {
            return symbol;
        }
    }

    /** The functions of {@link Call}, named as in the source. */
    enum Function {
        SQRT, EXP, LOG, GAMMA;

        /** The source name: {@code sqrt}, {@code exp}, {@code log} (natural) or {@code gamma}. */
        public String sourceName() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /** An exact rational number (a literal, or the value of a parameter). */
    record Number(Rational value, int column) implements ConstExpr {
        @Override
        public String toString() {
            return ConstEval.format(this);
        }
    }

    /** The constant pi. */
    record Pi(int column) implements ConstExpr {
        @Override
        public String toString() {
            return "pi";
        }
    }

    /** Unary minus. */
    record Negate(ConstExpr operand, int column) implements ConstExpr {
        @Override
        public String toString() {
            return ConstEval.format(this);
        }
    }

    /** A binary operation; {@code column} is the operator's (or, for a juxtaposition, the right factor's). */
    record Binary(Op op, ConstExpr left, ConstExpr right, int column) implements ConstExpr {
        @Override
        public String toString() {
            return ConstEval.format(this);
        }
    }

    /** A function applied to one argument; {@code column} is the function name's. */
    record Call(Function function, ConstExpr argument, int column) implements ConstExpr {
        @Override
        public String toString() {
            return ConstEval.format(this);
        }
    }
}
