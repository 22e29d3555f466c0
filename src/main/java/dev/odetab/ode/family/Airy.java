package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;

/**
 * Airy functions Ai and Bi: solutions of y'' − x y = 0 (DLMF 9.2.1), normalized at 0 by
 * DLMF 9.2.3–9.2.6: Ai(0) = 1/(3^(2/3) Γ(2/3)), Ai'(0) = −1/(3^(1/3) Γ(1/3)),
 * Bi(0) = 1/(3^(1/6) Γ(2/3)), Bi'(0) = 3^(1/6)/Γ(1/3).
 */
public final class Airy implements Family {
    /** y'' − x y = 0. */
    public static final Equation EQUATION = new Equation(Poly.ONE, Poly.ZERO, Poly.X.negate());

    private final boolean bi;

    private Airy(boolean bi) {
        this.bi = bi;
    }

    public static Airy ai() {
        return new Airy(false);
    }

    public static Airy bi() {
        return new Airy(true);
    }

    @Override
    public String name() {
        return bi ? "airy-bi" : "airy-ai";
    }

    @Override
    public String equation() {
        return "y'' - x*y = 0";
    }

    @Override
    public String title() {
        return bi ? "Airy function Bi(x) (DLMF 9.2)" : "Airy function Ai(x) (DLMF 9.2)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of();
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) {
        String value = bi ? "1/(3^(1/6)*gamma(2/3))" : "1/(3^(2/3)*gamma(2/3))";
        String slope = bi ? "3^(1/6)/gamma(1/3)" : "-1/(3^(1/3)*gamma(1/3))";
        return new FunctionDef(name(), EQUATION, Rational.ZERO, Normalizations.parse(value, Map.of()),
                Normalizations.parse(slope, Map.of()), Map.of(), bi ? "DLMF 9.2.1, 9.2.5, 9.2.6" : "DLMF 9.2.1, 9.2.3, 9.2.4");
    }
}
