package dev.odetab.spec;

import dev.odetab.base.ExprException;
import dev.odetab.base.InputError;
import dev.odetab.expr.ExprParser;
import dev.odetab.numeric.Rational;
import java.util.Map;
import java.util.Optional;

/**
 * The one reader of exact points in a spec: grid {@code from}, {@code to} and {@code step}, the ends
 * of a search or a Chebyshev grid, and the entries of {@code points} all take the same values —
 * a TOML integer, or a string holding an exact decimal, a C99 hex float or a rational
 * ({@code "-7.25"}, {@code "0x1p-2"}, {@code "1/3"}; {@link Rational#parse}) or any exact constant
 * expression ({@code "2^-3"}, {@code "1/3 + 1/6"}). Trust level: Exact (no value passes through a
 * binary double; a TOML float is refused).
 */
final class ExactPoints {
    /** Where an error goes: the column inside the string (1-based; 0 for the value as a whole) and the message. */
    interface Locator {
        InputError at(int columnInString, String message);
    }

    private ExactPoints() {
    }

    /**
     * The exact rational that {@code v} denotes.
     *
     * @param what the noun of the messages ({@code "point"}, {@code "number"})
     * @throws InputError located by {@code where} when {@code v} is a float, not a string, or not an exact constant
     */
    static Rational parse(Object v, String what, Locator where) throws InputError {
        if (v instanceof Long l) {
            return Rational.of(l);
        }
        if (v instanceof Double) {
            throw where.at(0, "write the " + what + " as a string (\"0.1\") so that it stays exact; TOML floats are binary");
        }
        if (!(v instanceof String s)) {
            throw where.at(0, "a " + what + " must be an exact number written as a string (\"0.1\", \"1/3\", \"2^-3\")");
        }
        try {
            return Rational.parse(s);
        } catch (NumberFormatException notPlain) {
            // not a plain number: an exact constant expression, or an error located inside the string
        }
        Optional<Rational> exact;
        try {
            exact = ExprParser.parseConstant(s, Map.of()).exact();
        } catch (ExprException e) {
            throw where.at(e.column(), e.getMessage());
        }
        return exact.orElseThrow(() -> where.at(0, "'" + s + "' is not an exact rational; grid points must be exact"));
    }
}
