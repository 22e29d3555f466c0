package dev.odetab.series;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The start of a function normalized at an ordinary point a: y(a) and y'(a) are its exact
 * constant expressions ({@code value}, {@code slope}), evaluated to balls.
 *
 * <p>Trust level: Rigorous. The balls come from {@link dev.odetab.expr.ConstExpr#evaluate},
 * whose results contain the exact constants, at {@value #CONSTANT_GUARD_BITS} bits more than
 * asked for, so that they do not dominate the radius of a walk. They are pure functions of the
 * function and the precision, so they are kept once per pair (gamma at 200 bits costs
 * milliseconds, and every precision loop asks again).
 *
 * @param function the function whose normalization this is
 */
public record OrdinaryStart(FunctionDef function) implements Start {
    /** Extra bits for the normalization constants, so that they do not dominate the radius. */
    private static final int CONSTANT_GUARD_BITS = 16;

    private static final Map<Key, Jet> CONSTANTS = new ConcurrentHashMap<>();

    private record Key(FunctionDef f, int precBits) {
    }

    @Override
    public Equation equation() {
        return function.equation();
    }

    @Override
    public Rational point() {
        return function.at();
    }

    @Override
    public Jet jet(int precBits) throws ExprException {
        Key key = new Key(function, precBits);
        Jet known = CONSTANTS.get(key);
        if (known != null) {
            return known;
        }
        Jet start = new Jet(function.value().evaluate(precBits + CONSTANT_GUARD_BITS),
                function.slope().evaluate(precBits + CONSTANT_GUARD_BITS));
        if (CONSTANTS.size() > 4096) {
            CONSTANTS.clear();
        }
        CONSTANTS.put(key, start);
        return start;
    }
}
