package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;

/**
 * Probabilists' Hermite polynomial He_n(x) (DLMF 18.3), the solution of y'' − x y' + n y = 0
 * (DLMF 18.8, Table 18.8.1). With He_n(x) = 2^(−n/2) H_n(x/√2) (DLMF 18.7) and DLMF 18.5.13:
 * He_n(0) = (−1)^(n/2) n! / (2^(n/2) (n/2)!) for even n and 0 for odd n; He_n'(0) = n He_(n−1)(0)
 * (DLMF 18.9.26, He_n' = n He_(n−1)).
 */
public final class HermiteHe implements Family {
    @Override
    public String name() {
        return "hermite-he";
    }

    @Override
    public String equation() {
        return "y'' - x*y' + n*y = 0";
    }

    @Override
    public String title() {
        return "probabilists' Hermite polynomial He_n(x) (DLMF 18.3, 18.8)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE);
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        Equation eq = new Equation(Poly.ONE, Poly.of(Rational.ZERO, Rational.of(-1)), Poly.constant(Rational.of(n)));
        Rational slope = n == 0 ? Rational.ZERO : atZero(n - 1).multiply(n);
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.exact(atZero(n)), Normalizations.exact(slope),
                Map.of("n", Rational.of(n)), "DLMF 18.3, 18.5.13, 18.7, 18.8 (Table 18.8.1), 18.9.26");
    }

    /** He_n(0) = 2^(−n/2) H_n(0), exactly. */
    static Rational atZero(int n) {
        return Rational.of(HermiteFunction.hermiteAtZero(n), BigInteger.ONE.shiftLeft(n / 2));
    }
}
