package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;

/**
 * Parabolic cylinder function U(a, x): the solution of Weber's equation y'' − (x²/4 + a) y = 0
 * (DLMF 12.2.2) with U(a, 0) = √π / (2^(a/2 + 1/4) Γ(3/4 + a/2)) and
 * U'(a, 0) = −√π / (2^(a/2 − 1/4) Γ(1/4 + a/2)) (DLMF 12.2.6, 12.2.7). Where Γ has a pole
 * the reciprocal 1/Γ is zero, and so is the value or the slope.
 */
public final class Weber implements Family {
    static final Rational MAX_ABS_A = Rational.of(1000);

    @Override
    public String name() {
        return "weber-u";
    }

    @Override
    public String equation() {
        return "y'' - (x^2/4 + a)*y = 0";
    }

    @Override
    public String title() {
        return "parabolic cylinder function U(a, x) (DLMF 12.2)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(new Parameter("a", "order parameter", "a rational number with |a| <= " + MAX_ABS_A));
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        Rational a = values.get("a");
        if (a == null) {
            throw new ParameterException("a", "missing parameter a (a rational number with |a| <= " + MAX_ABS_A + ")");
        }
        if (a.abs().compareTo(MAX_ABS_A) > 0) {
            throw new ParameterException("a", "a = " + a.toDecimalOrFraction() + " is outside the allowed range: |a| <= " + MAX_ABS_A);
        }
        Equation eq = new Equation(Poly.ONE, Poly.ZERO, Poly.of(a.negate(), Rational.ZERO, Rational.of(-1, 4)));
        Rational half = a.divide(Rational.TWO);
        Rational gValue = Rational.of(3, 4).add(half);
        Rational gSlope = Rational.of(1, 4).add(half);
        String aa = Normalizations.literal(a);
        String value = isPole(gValue) ? "0" : "sqrt(pi)/(2^(" + aa + "/2+1/4)*gamma(3/4+" + aa + "/2))";
        String slope = isPole(gSlope) ? "0" : "-sqrt(pi)/(2^(" + aa + "/2-1/4)*gamma(1/4+" + aa + "/2))";
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.parse(value, Map.of()),
                Normalizations.parse(slope, Map.of()), Map.of("a", a), "DLMF 12.2.2, 12.2.6, 12.2.7");
    }

    private static boolean isPole(Rational g) {
        return g.isInteger() && g.signum() <= 0;
    }
}
