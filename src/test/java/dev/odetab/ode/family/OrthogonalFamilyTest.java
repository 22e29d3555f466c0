package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Rational;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/**
 * The Gauss data the families hold: the catalog lists exactly the families that implement
 * {@link OrthogonalFamily}; the rule parameters are parameters of the family; symmetry follows
 * the weight (DLMF 18.6.1: w(−x) = w(x) except on (0, ∞) and for Jacobi with α ≠ β); the
 * closed-form Chebyshev nodes belong to the two Chebyshev families only.
 */
class OrthogonalFamilyTest {
    @Test
    void theCatalogListsEveryFamilyWithAGaussRule() {
        List<String> implementing = Catalog.names().stream().filter(n -> Catalog.lookup(n).orElseThrow() instanceof OrthogonalFamily)
                .sorted().toList();
        List<String> listed = Catalog.withGaussRules().stream().map(Family::name).sorted().toList();
        assertEquals(implementing, listed);
        assertEquals("legendre-p, hermite-h, laguerre-l, chebyshev-t, chebyshev-u, gegenbauer-c, jacobi-p", Catalog.gaussRuleNames());
    }

    @Test
    void ruleParametersAreParametersOfTheFamily() {
        for (OrthogonalFamily f : Catalog.withGaussRules()) {
            List<String> names = f.parameters().stream().map(Family.Parameter::name).toList();
            assertTrue(names.containsAll(f.ruleParameters()), f.name() + ": " + f.ruleParameters() + " not in " + names);
            assertFalse(f.ruleParameters().contains("n"), f.name());
        }
    }

    @Test
    void symmetryAndClosedFormsFollowTheWeight() {
        Map<String, Rational> none = Map.of("n", Rational.of(4));
        for (OrthogonalFamily f : Catalog.withGaussRules()) {
            boolean chebyshev = f.name().startsWith("chebyshev-");
            assertEquals(chebyshev, f.chebyshevNodes().isPresent(), f.name());
            if (!f.name().equals("jacobi-p")) {
                assertEquals(f.interval() != OrthogonalFamily.Interval.HALF_LINE, f.symmetric(none), f.name());
            }
        }
        assertEquals(OptionalInt.of(1), new ChebyshevT().chebyshevNodes());
        assertEquals(OptionalInt.of(2), new ChebyshevU().chebyshevNodes());
        JacobiP jacobi = new JacobiP();
        assertTrue(jacobi.symmetric(Map.of("alpha", Rational.of(1, 2), "beta", Rational.of(1, 2))));
        assertFalse(jacobi.symmetric(Map.of("alpha", Rational.of(1, 2), "beta", Rational.of(-1, 3))));
    }
}
