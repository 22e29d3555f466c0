package dev.odetab.reference;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.apache.commons.math3.fraction.BigFraction;

/**
 * Writes two reference files for the orthogonal polynomial families, both in exact rational
 * arithmetic (commons-math3 {@link BigFraction}, not odetab's own numbers):
 *
 * <ul>
 * <li>{@code reference-data/orthogonal-polynomials-closed-forms.csv}: closed-form special
 * values (P_n(0), P_n(1), H_n(0), He_n(0), T_n(1/2), U_n(1), L_n^(α)(0), C_n^(λ)(1),
 * P_n^(α,β)(1)), each row naming its DLMF equation.</li>
 * <li>{@code reference-data/orthogonal-polynomials-commons-math3-3.6.1.csv}: P_n, T_n, H_n, L_n
 * at x = 1/2, 3/4, −5/8, n = 0 … 12, from the coefficients of commons-math3 3.6.1
 * {@code PolynomialsUtils.create…Polynomial(n)}. Chebyshev and Hermite coefficients are checked
 * to be integers below 2^53, Legendre coefficients k/2^n with |k| < 2^53 (so the doubles are the
 * exact coefficients). The Laguerre
 * coefficients are k/n!, which doubles cannot hold; each is recovered as the fraction k/n!
 * nearest to commons-math's double, and the generator insists that this double is exactly
 * the double nearest to k/n!.</li>
 * </ul>
 *
 * A value that terminates as a decimal is written exactly, padded to at least 40 significant
 * digits (so the check's "± ½ unit of the last digit" is tight); any other value is rounded to
 * 40 significant digits.
 */
public final class PolynomialReferenceData {
    public static final Path CLOSED_FORMS = Path.of("reference-data/orthogonal-polynomials-closed-forms.csv");
    public static final Path COMMONS = Path.of("reference-data/orthogonal-polynomials-commons-math3-3.6.1.csv");
    static final int DIGITS = 40;
    static final String COMMONS_SOURCE = "commons-math3 3.6.1";

    private PolynomialReferenceData() {
    }

    /** The decimal written for an exact rational (see the class comment). */
    static String decimal(BigFraction q) {
        BigDecimal num = new BigDecimal(q.getNumerator());
        BigDecimal den = new BigDecimal(q.getDenominator());
        BigDecimal d;
        try {
            d = num.divide(den);
        } catch (ArithmeticException nonTerminating) {
            return num.divide(den, new MathContext(DIGITS, RoundingMode.HALF_EVEN)).toPlainString();
        }
        if (d.signum() == 0) {
            return BigDecimal.ZERO.setScale(DIGITS).toPlainString();
        }
        if (d.precision() < DIGITS) {
            d = d.setScale(d.scale() + DIGITS - d.precision());
        }
        return d.toPlainString();
    }

    private static BigFraction pochhammerOverFactorial(BigFraction a, int n) {
        BigFraction r = BigFraction.ONE;
        for (int j = 0; j < n; j++) {
            r = r.multiply(a.add(j)).divide(j + 1);
        }
        return r;
    }

    private static BigInteger factorial(int n) {
        BigInteger r = BigInteger.ONE;
        for (int k = 2; k <= n; k++) {
            r = r.multiply(BigInteger.valueOf(k));
        }
        return r;
    }

    private static String row(String function, String params, String x, BigFraction value, String source) {
        return function + "," + params + "," + x + ",value," + decimal(value) + "," + source + "\n";
    }

    static String closedForms() {
        StringBuilder sb = new StringBuilder();
        sb.append("# Closed-form special values of the classical orthogonal polynomials, computed in exact rational arithmetic\n");
        sb.append("# by src/test/java/dev/odetab/reference/PolynomialReferenceData.java. Sources (DLMF equation numbers from memory):\n");
        sb.append("# DLMF 14.5.1 with mu = 0: P_2k(0) = (-1)^k (2k)!/(4^k k!^2), P_2k+1(0) = 0; DLMF 18.6.1 (Table): P_n(1) = 1,\n");
        sb.append("# U_n(1) = n+1, L_n^(a)(0) = (a+1)_n/n!, C_n^(l)(1) = (2l)_n/n!, P_n^(a,b)(1) = (a+1)_n/n!; DLMF 18.5.13 (explicit sum)\n");
        sb.append("# at x = 0: H_2k(0) = (-1)^k (2k)!/k!, He_2k(0) = (-1)^k (2k)!/(2^k k!), odd degrees 0; DLMF 18.5.1:\n");
        sb.append("# T_n(cos t) = cos(nt), so T_n(1/2) = cos(n pi/3). Terminating values are exact; others rounded to 40 digits.\n");
        sb.append("function,parameters,x,quantity,value,source\n");
        for (int n = 0; n <= 20; n++) {
            BigFraction v = BigFraction.ZERO;
            if (n % 2 == 0) {
                int k = n / 2;
                v = new BigFraction(factorial(2 * k), BigInteger.valueOf(4).pow(k).multiply(factorial(k).pow(2)));
                v = k % 2 == 0 ? v : v.negate();
            }
            sb.append(row("legendre-p", "n=" + n, "0", v, "DLMF 14.5.1"));
        }
        for (int n = 0; n <= 20; n++) {
            sb.append(row("legendre-p", "n=" + n, "1", BigFraction.ONE, "DLMF 18.6.1"));
        }
        for (int n = 0; n <= 20; n++) {
            BigFraction v = BigFraction.ZERO;
            if (n % 2 == 0) {
                int k = n / 2;
                v = new BigFraction(factorial(2 * k), factorial(k));
                v = k % 2 == 0 ? v : v.negate();
            }
            sb.append(row("hermite-h", "n=" + n, "0", v, "DLMF 18.5.13"));
        }
        for (int n = 0; n <= 20; n++) {
            BigFraction v = BigFraction.ZERO;
            if (n % 2 == 0) {
                int k = n / 2;
                v = new BigFraction(factorial(2 * k), BigInteger.TWO.pow(k).multiply(factorial(k)));
                v = k % 2 == 0 ? v : v.negate();
            }
            sb.append(row("hermite-he", "n=" + n, "0", v, "DLMF 18.5.13 with He_n(x) = 2^(-n/2) H_n(x/sqrt 2)"));
        }
        BigFraction half = new BigFraction(1, 2);
        BigFraction[] cosNPiOver3 = {BigFraction.ONE, half, half.negate(), BigFraction.MINUS_ONE, half.negate(), half};
        for (int n = 0; n <= 20; n++) {
            sb.append(row("chebyshev-t", "n=" + n, "0.5", cosNPiOver3[n % 6], "DLMF 18.5.1"));
        }
        for (int n = 0; n <= 20; n++) {
            sb.append(row("chebyshev-u", "n=" + n, "1", new BigFraction(n + 1), "DLMF 18.6.1"));
        }
        String[] alphas = {"0", "1/2", "1/3"};
        for (String a : alphas) {
            for (int n = 0; n <= 12; n++) {
                sb.append(row("laguerre-l", "n=" + n + ";alpha=" + a, "0", pochhammerOverFactorial(parse(a).add(1), n), "DLMF 18.6.1"));
            }
        }
        String[] lambdas = {"1/4", "3/4", "2"};
        for (String l : lambdas) {
            for (int n = 0; n <= 12; n++) {
                sb.append(row("gegenbauer-c", "n=" + n + ";lambda=" + l, "1", pochhammerOverFactorial(parse(l).multiply(2), n), "DLMF 18.6.1"));
            }
        }
        String[][] ab = {{"1/2", "-1/2"}, {"1/3", "2"}, {"3", "1/4"}};
        for (String[] p : ab) {
            for (int n = 0; n <= 12; n++) {
                sb.append(row("jacobi-p", "n=" + n + ";alpha=" + p[0] + ";beta=" + p[1], "1", pochhammerOverFactorial(parse(p[0]).add(1), n),
                        "DLMF 18.6.1"));
            }
        }
        return sb.toString();
    }

    private static BigFraction parse(String s) {
        String[] pq = s.split("/");
        return pq.length == 1 ? new BigFraction(new BigInteger(pq[0])) : new BigFraction(new BigInteger(pq[0]), new BigInteger(pq[1]));
    }

    /**
     * A coefficient that must be k/2^e with |k| < 2^53 (e = n for Legendre, whose 2^n P_n has integer
     * coefficients; e = 0 for Chebyshev and Hermite): then the double is that fraction exactly. Every
     * double is some dyadic fraction, so the bound on the denominator is what makes this a check.
     */
    static BigFraction dyadic(double c, int e, String what) {
        if (c == 0) {
            return BigFraction.ZERO;
        }
        BigFraction f = new BigFraction(c);
        BigInteger k = f.multiply(BigInteger.TWO.pow(e)).getNumerator();
        if (f.getDenominator().bitLength() - 1 > e || k.abs().bitLength() > 53) {
            throw new IllegalStateException(what + ": coefficient " + c + " is not k/2^" + e + " with |k| < 2^53");
        }
        return f;
    }

    /** The Laguerre coefficient k/n! whose nearest double is c (which must hold exactly). */
    static BigFraction overFactorial(double c, int n, String what) {
        BigInteger nf = factorial(n);
        BigInteger k = new BigDecimal(c).multiply(new BigDecimal(nf)).setScale(0, RoundingMode.HALF_EVEN).toBigIntegerExact();
        BigFraction f = new BigFraction(k, nf);
        if (f.doubleValue() != c) {
            throw new IllegalStateException(what + ": coefficient " + c + " is not the double nearest to " + k + "/" + n + "!");
        }
        return f;
    }

    static BigFraction evaluate(BigFraction[] coefficients, BigFraction x) {
        BigFraction r = BigFraction.ZERO;
        for (int j = coefficients.length - 1; j >= 0; j--) {
            r = r.multiply(x).add(coefficients[j]);
        }
        return r;
    }

    static String commons() {
        StringBuilder sb = new StringBuilder();
        sb.append("# Legendre P_n, Chebyshev T_n, Hermite H_n (physicists') and Laguerre L_n at x = 1/2, 3/4, -5/8, n = 0..12.\n");
        sb.append("# source: commons-math3 3.6.1, PolynomialsUtils.createLegendrePolynomial, createChebyshevPolynomial,\n");
        sb.append("# createHermitePolynomial, createLaguerrePolynomial (getCoefficients()), evaluated exactly by\n");
        sb.append("# src/test/java/dev/odetab/reference/PolynomialReferenceData.java. T, H coefficients are integers, P_n ones k/2^n,\n");
        sb.append("# |k| < 2^53 (checked), hence exact; L_n coefficients are recovered as the k/n! whose nearest double commons-math returns.\n");
        sb.append("# Terminating values are exact; the Laguerre values are rounded to 40 significant digits.\n");
        sb.append("function,parameters,x,quantity,value,source\n");
        String[] xs = {"0.5", "0.75", "-0.625"};
        String[] families = {"legendre-p", "chebyshev-t", "hermite-h", "laguerre-l"};
        for (String family : families) {
            for (int n = 0; n <= 12; n++) {
                PolynomialFunction p = switch (family) {
                    case "legendre-p" -> PolynomialsUtils.createLegendrePolynomial(n);
                    case "chebyshev-t" -> PolynomialsUtils.createChebyshevPolynomial(n);
                    case "hermite-h" -> PolynomialsUtils.createHermitePolynomial(n);
                    default -> PolynomialsUtils.createLaguerrePolynomial(n);
                };
                double[] c = p.getCoefficients();
                BigFraction[] exact = new BigFraction[c.length];
                for (int j = 0; j < c.length; j++) {
                    String what = family + " n=" + n + " x^" + j;
                    exact[j] = family.equals("laguerre-l") ? overFactorial(c[j], n, what) : dyadic(c[j], family.equals("legendre-p") ? n : 0, what);
                }
                for (String x : xs) {
                    sb.append(row(family, "n=" + n, x, evaluate(exact, new BigFraction(new BigDecimal(x).doubleValue())), COMMONS_SOURCE));
                }
            }
        }
        return sb.toString();
    }

    /** Writes both files (a second or so). */
    public static void main(String[] args) throws IOException {
        Files.writeString(CLOSED_FORMS, closedForms(), StandardCharsets.UTF_8);
        Files.writeString(COMMONS, commons(), StandardCharsets.UTF_8);
    }
}
