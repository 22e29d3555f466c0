package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;

/**
 * Legendre function of the second kind Q_n(x) for −1 < x < 1 (Ferrers' function, DLMF 14.3.2
 * with μ = 0), the second solution of Legendre's equation (DLMF 14.2.1). Its values at 0 are
 * DLMF 14.5.3 and 14.5.4 with μ = 0:
 * Q_ν(0) = −(√π/2) sin(νπ/2) Γ((ν + 1)/2) / Γ(ν/2 + 1) and
 * Q_ν'(0) = √π cos(νπ/2) Γ(ν/2 + 1) / Γ((ν + 1)/2).
 * For integer n the powers of π cancel (Γ(k + 1/2) = (2k − 1)!! √π / 2^k):
 * Q_n(0) = 0 and Q_n'(0) = (−1)^k (2k)!!/(2k − 1)!! for n = 2k,
 * Q_n(0) = (−1)^(k+1) (2k)!!/(2k + 1)!! and Q_n'(0) = 0 for n = 2k + 1
 * (Q_0 = artanh x and Q_1 = x artanh x − 1, DLMF 14.5.22, 14.5.23, agree). The values are exact
 * rationals but the series does not terminate, so the ball series is used; the singular points
 * ±1 bound the domain.
 */
public final class LegendreQ implements Family {
    @Override
    public String name() {
        return "legendre-q";
    }

    @Override
    public String equation() {
        return "(1 - x^2)*y'' - 2*x*y' + n*(n + 1)*y = 0";
    }

    @Override
    public String title() {
        return "Legendre function of the second kind Q_n(x), -1 < x < 1 (DLMF 14.3, 14.5)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE);
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        int k = n / 2;
        Rational value = Rational.ZERO;
        Rational slope = Rational.ZERO;
        Rational ratio = Rational.ONE;
        if (n % 2 == 0) {
            for (int j = 1; j <= k; j++) {
                ratio = ratio.multiply(Rational.of(2L * j, 2L * j - 1));
            }
            slope = ratio.multiply(Degrees.sign(k));
        } else {
            for (int j = 1; j <= k; j++) {
                ratio = ratio.multiply(Rational.of(2L * j, 2L * j + 1));
            }
            value = ratio.multiply(Degrees.sign(k + 1));
        }
        return new FunctionDef(name(), LegendreP.equation(n), Rational.ZERO, Normalizations.exact(value),
                Normalizations.exact(slope), Map.of("n", Rational.of(n)), "DLMF 14.2.1, 14.3.2, 14.5.3, 14.5.4");
    }
}
