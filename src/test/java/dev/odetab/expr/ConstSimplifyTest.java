package dev.odetab.expr;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Normalizations print simplified, and the simplified constant encloses the same value. */
class ConstSimplifyTest {
    private static String simplified(String text, Map<String, Rational> params) throws ExprException {
        ConstExpr e = ExprParser.parseConstant(text, params);
        ConstExpr s = ConstSimplify.of(e);
        // the same value: the two enclosures at 200 bits overlap (STYLE.md "Tests": two ways, overlapping)
        Ball a = e.evaluate(200);
        Ball b = s.evaluate(200);
        assertTrue(a.lower().compareTo(b.upper()) <= 0 && b.lower().compareTo(a.upper()) <= 0, text + " and " + s);
        return s.toString();
    }

    @Test
    void exactSubexpressionsFoldAndUnitsDrop() throws ExprException {
        // the constants of issue 16: ψ₀'s slope and weber-u's value at a = −1/2
        assertEquals("0", simplified("0/sqrt(1*sqrt(pi))", Map.of()));
        assertEquals("1/sqrt(sqrt(pi))", simplified("1/sqrt(1*sqrt(pi))", Map.of()));
        assertEquals("sqrt(pi)/gamma(0.5)", simplified("sqrt(pi)/(2^((-1/2)/2+1/4)*gamma(3/4+(-1/2)/2))", Map.of()));
        assertEquals("sqrt(pi)/(2^1.75*gamma(2.25))", simplified("sqrt(pi)/(2^(a/2+1/4)*gamma(3/4+a/2))", Map.of("a", Rational.of(3))));
        assertEquals("-pi", simplified("0 - pi*1", Map.of()));
        assertEquals("pi", simplified("(pi + 0)^1/1", Map.of()));
        assertEquals("1/(3^(2/3)*gamma(2/3))", simplified("1/(3^(2/3)*gamma(2/3))", Map.of()));
    }
}
