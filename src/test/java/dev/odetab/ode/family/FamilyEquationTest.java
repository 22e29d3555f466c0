package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.odetab.base.ExprException;
import dev.odetab.expr.EquationParser;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The equation a family shows (odetab families) is the one it builds, for sample parameter values. */
class FamilyEquationTest {
    private static final Map<String, Map<String, Rational>> SAMPLES = Map.ofEntries(
            Map.entry("airy-ai", Map.of()), Map.entry("airy-bi", Map.of()),
            Map.entry("hermite-h", Map.of("n", Rational.of(7))), Map.entry("hermite-he", Map.of("n", Rational.of(5))),
            Map.entry("hermite-function", Map.of("n", Rational.of(4))), Map.entry("legendre-p", Map.of("n", Rational.of(6))),
            Map.entry("legendre-q", Map.of("n", Rational.of(3))), Map.entry("chebyshev-t", Map.of("n", Rational.of(9))),
            Map.entry("chebyshev-u", Map.of("n", Rational.of(8))),
            Map.entry("laguerre-l", Map.of("n", Rational.of(4), "alpha", Rational.of(3, 2))),
            Map.entry("gegenbauer-c", Map.of("n", Rational.of(5), "lambda", Rational.of(3, 4))),
            Map.entry("jacobi-p", Map.of("n", Rational.of(4), "alpha", Rational.of(1, 3), "beta", Rational.of(-1, 2))),
            Map.entry("weber-u", Map.of("a", Rational.of(-7, 3))));

    @Test
    void theShownEquationIsTheBuiltOne() throws ExprException, ParameterException {
        assertEquals(new java.util.TreeSet<>(Catalog.names()), new java.util.TreeSet<>(SAMPLES.keySet()), "a sample for every family");
        for (String name : Catalog.names()) {
            Family f = Catalog.lookup(name).orElseThrow();
            Map<String, Rational> values = SAMPLES.get(name);
            Equation shown = Equation.of(EquationParser.parse(f.equation(), values));
            Equation built = f.define(values).equation();
            assertEquals(built, shown, name + ": " + f.equation() + " with " + values);
        }
    }
}
