package dev.odetab.ode;

import dev.odetab.expr.ConstExpr;
import dev.odetab.numeric.Rational;
import java.util.Map;

/**
 * A function = an equation + a normalization: the solution of {@code equation} with
 * y(at) = value and y'(at) = slope.
 *
 * @param name how users call it ({@code airy-ai}, {@code demo.toml#ai})
 * @param equation the equation, with exact rational polynomial coefficients
 * @param at an ordinary point of the equation, exact
 * @param value the exact expression of y(at)
 * @param slope the exact expression of y'(at)
 * @param parameters the parameter values it was built from (empty for spec functions)
 * @param source where the equation and the normalization come from (DLMF numbers)
 */
public record FunctionDef(String name, Equation equation, Rational at, ConstExpr value, ConstExpr slope,
        Map<String, Rational> parameters, String source) {
    public FunctionDef {
        parameters = Map.copyOf(parameters);
    }
}
