package dev.odetab.ode.family;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The built-in families by name. */
public final class Catalog {
    private static final Map<String, Family> FAMILIES = new LinkedHashMap<>();
    /** The families with a Gauss rule, in the order messages list them (Legendre, Hermite, Laguerre, then the Jacobi family). */
    private static final List<OrthogonalFamily> GAUSS_RULES;

    static {
        HermiteH hermite = new HermiteH();
        LegendreP legendre = new LegendreP();
        ChebyshevT chebyshevT = new ChebyshevT();
        ChebyshevU chebyshevU = new ChebyshevU();
        LaguerreL laguerre = new LaguerreL();
        GegenbauerC gegenbauer = new GegenbauerC();
        JacobiP jacobi = new JacobiP();
        for (Family f : List.of(Airy.ai(), Airy.bi(), hermite, new HermiteHe(), new HermiteFunction(),
                legendre, new LegendreQ(), chebyshevT, chebyshevU, laguerre, gegenbauer, jacobi, new Weber())) {
            FAMILIES.put(f.name(), f);
        }
        GAUSS_RULES = List.of(legendre, hermite, laguerre, chebyshevT, chebyshevU, gegenbauer, jacobi);
    }

    private Catalog() {
    }

    public static Optional<Family> lookup(String name) {
        return Optional.ofNullable(FAMILIES.get(name));
    }

    public static List<String> names() {
        return new ArrayList<>(FAMILIES.keySet());
    }

    /** The families with a Gauss rule (quadrature tables take these). */
    public static List<OrthogonalFamily> withGaussRules() {
        return GAUSS_RULES;
    }

    /** Their names, comma-separated, for messages. */
    public static String gaussRuleNames() {
        return String.join(", ", GAUSS_RULES.stream().map(Family::name).toList());
    }
}
