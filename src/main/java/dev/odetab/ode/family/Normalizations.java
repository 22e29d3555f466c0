package dev.odetab.ode.family;

import dev.odetab.expr.ConstExpr;
import dev.odetab.base.ExprException;
import dev.odetab.expr.ExprParser;
import dev.odetab.numeric.Rational;
import java.util.Map;

/** Parsing of the families' own normalization constants; a failure here is a bug in a family. */
final class Normalizations {
    private Normalizations() {
    }

    static ConstExpr parse(String text, Map<String, Rational> params) {
        try {
            return ExprParser.parseConstant(text, params);
        } catch (ExprException e) {
            throw new IllegalStateException("built-in constant '" + text + "' does not parse: " + e.getMessage(), e);
        }
    }

    /** An exact rational normalization constant. */
    static ConstExpr exact(Rational r) {
        return parse(r.toString(), Map.of());
    }

    /** The value as an exact parameter, for expressions: {@code (-1/3)}. */
    static String literal(Rational r) {
        return "(" + r + ")";
    }
}
