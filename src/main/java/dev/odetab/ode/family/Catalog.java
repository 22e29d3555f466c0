package dev.odetab.ode.family;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The built-in families by name. */
public final class Catalog {
    private static final Map<String, Family> FAMILIES = new LinkedHashMap<>();

    static {
        for (Family f : List.of(Airy.ai(), Airy.bi(), new HermiteH(), new HermiteHe(), new HermiteFunction(),
                new LegendreP(), new LegendreQ(), new ChebyshevT(), new ChebyshevU(), new LaguerreL(), new GegenbauerC(),
                new JacobiP(), new Weber())) {
            FAMILIES.put(f.name(), f);
        }
    }

    private Catalog() {
    }

    public static Optional<Family> lookup(String name) {
        return Optional.ofNullable(FAMILIES.get(name));
    }

    public static List<String> names() {
        return new ArrayList<>(FAMILIES.keySet());
    }
}
