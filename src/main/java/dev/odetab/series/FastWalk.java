package dev.odetab.series;

import dev.odetab.numeric.DDBall;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.RealPath;
import dev.odetab.ode.SingularCrossingException;

/**
 * Enclosures of a solution on a run of equally spaced points x0, x0 + h, …, in double-double
 * ball arithmetic: one long jump to x0 in BigDecimal balls, then short steps from point to point
 * ({@link FastStepper}; docs/methods.md §4, dense grids and parallel chunks).
 *
 * <p>Trust level: Rigorous. The state at x0 is given as BigDecimal balls (the caller's long
 * jump, {@link GridWalk} at {@link #START_BITS} bits), converted outward to {@link DDBall}s. Every
 * later center is x0 + k·h/s (s sub-steps per grid step, chosen by
 * {@link StepChooser#chooseSubsteps}; exact rationals) enclosed by a ball
 * built by rigorous additions of a ball containing h/s; each step encloses the state at the next
 * exact center. So every non-null jet contains y and y' at its point. A step that cannot be
 * proven ends the walk: the remaining jets are null and the caller evaluates them in the
 * BigDecimal tier. The long jump is not done in double-double: over long distances the radius of
 * componentwise balls grows like exp(∫ |ω|) (the wrapping effect), which a 192-bit start absorbs
 * and a 106-bit one does not.
 *
 * <p>Derivation: docs/methods.md §10 (the fast tier).
 */
public final class FastWalk {
    /** Working precision of the long jumps: enough that their radius does not dominate 106-bit balls. */
    public static final int START_BITS = 192;

    private FastWalk() {
    }

    /**
     * Balls {value, derivative} at x0 + i·h for i = 0 … count−1 (null from the first point that
     * could not be proven), starting from balls containing y(x0) and y'(x0); null when a real
     * singular point lies within the run (the BigDecimal tier then reports it).
     */
    public static DDBall[][] walk(Equation equation, Rational x0, Jet start, Rational h, int count) {
        Equation reduced = equation.reduced();
        Rational last = x0.add(h.multiply(Rational.of(count - 1)));
        try {
            RealPath.checkPath(reduced, equation, x0, last);
        } catch (SingularCrossingException e) {
            return null;
        }
        DDBall[][] out = new DDBall[count][];
        DDBall[] state = {DDBall.of(start.value()), DDBall.of(start.derivative())};
        if (!state[0].isFinite() || !state[1].isFinite()) {
            return out;
        }
        out[0] = state;
        if (count == 1) {
            return out;
        }
        FastStepper stepper = new FastStepper(reduced);
        int sub = StepChooser.chooseSubsteps(reduced, x0, last, h);
        Rational exactStep = h.divide(Rational.of(sub));
        DDBall step = DDBall.of(exactStep);
        DDBall[] powers = stepper.powers(step);
        DDBall inverse = DDBall.of(exactStep.reciprocal());
        DDBall center = DDBall.of(x0);
        for (int i = 1; i < count; i++) {
            for (int j = 0; j < sub; j++) {
                state = stepper.step(center, state[0], state[1], powers, inverse);
                if (state == null) {
                    return out;
                }
                center = center.add(step);
            }
            out[i] = state;
        }
        return out;
    }
}
