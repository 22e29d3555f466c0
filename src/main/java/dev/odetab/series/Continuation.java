package dev.odetab.series;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.RealPath;
import dev.odetab.ode.SingularCrossingException;

/**
 * Analytic continuation of a solution along the real line, by a chain of Taylor steps.
 *
 * <p>Trust level: Rigorous (docs/methods.md §4). Each step sums the series at the current center c
 * for the state at c + h with {@link LocalSeries#sum}, whose result encloses the exact state;
 * the next step starts from those balls, so the final balls contain y and y' at the target.
 * Every center is an exact rational (from + k·2^e, then the target itself), so the shifted
 * coefficients stay exact. The path never crosses a real singular point: before stepping, it is
 * checked by {@link RealPath#checkPath} (exact Sturm counts), and any root there is an error
 * that names it.
 *
 * <p>Step lengths are a heuristic choice ({@link StepChooser}, by default
 * {@link StepChooser.Use#CONTINUATION}); a step whose tail bound cannot be established is
 * halved and tried again. Digits lost to cancellation show in the
 * radius; the caller's precision loop pays for them.
 */
public final class Continuation {
    private Continuation() {
    }

    /** The enclosure at the target and the work done. */
    public record Result(Jet jet, int steps, int terms) {
    }

    /**
     * Balls containing y(to) and y'(to) for the solution whose state at {@code from} lies in
     * {@code start}.
     *
     * @throws SingularCrossingException when a real singular point lies on [from, to]
     */
    public static Result evaluate(Equation equation, Rational from, Jet start, Rational to, int precBits) {
        Equation eq = equation.reduced();
        if (from.equals(to)) {
            RealPath.checkPath(eq, equation, from, to);
            return new Result(start, 0, 0); // the start itself, exact zeros included
        }
        Carried r = walk(equation, CarriedState.of(eq, from, start), to, precBits);
        return new Result(r.state().jet(), r.steps(), r.terms());
    }

    /**
     * Balls containing y(to) and y'(to) for the solution that {@code start} names.
     *
     * @throws ExprException when a normalization constant cannot be evaluated
     * @throws SingularCrossingException when a real singular point lies between the start's point and {@code to}
     */
    public static Result evaluate(Start start, Rational to, int precBits) throws ExprException {
        return evaluate(start.equation(), start.point(), start.jet(precBits), to, precBits);
    }

    /**
     * The state at the start's point, as midpoints and one weighted error ({@link CarriedState}),
     * ready for {@link #walk}.
     *
     * @throws ExprException when a normalization constant cannot be evaluated
     * @throws SingularCrossingException when the start's point is a singular point
     */
    public static CarriedState begin(Start start, int precBits) throws ExprException {
        Equation eq = start.equation().reduced();
        RealPath.checkPath(eq, start.equation(), start.point(), start.point());
        return CarriedState.of(eq, start.point(), start.jet(precBits));
    }

    /**
     * Rigorous: balls containing y and y' at every point {@code center + t}, t in the ball
     * {@code t}, from balls containing them at the exact {@code center}: one series step with a
     * ball as its length (docs/methods.md §2, the tail bound over the whole ball), for points that are
     * not rational, such as Chebyshev nodes.
     *
     * @throws LocalSeries.StepTooLongException when |t| is too long for a tail bound
     */
    public static Jet stepOver(Equation equation, Rational center, Jet atCenter, Ball t, int precBits) {
        return LocalSeries.sum(new Recurrence(equation, center), atCenter.value(), atCenter.derivative(), t,
                StepChooser.chooseMaxTerms(precBits), precBits).jet();
    }

    /** The state at the target and the work done. */
    public record Carried(CarriedState state, int steps, int terms) {
    }

    /**
     * As {@link #evaluate}, with the state carried as midpoints and one weighted error
     * ({@link CarriedState}), so that walks made of many legs never re-wrap their error into
     * componentwise balls.
     *
     * @throws SingularCrossingException when a real singular point lies between the state's point and {@code to}
     */
    public static Carried walk(Equation equation, CarriedState start, Rational to, int precBits) {
        return walk(equation, start, to, precBits, StepChooser.Use.CONTINUATION);
    }

    /**
     * As {@link #walk(Equation, CarriedState, Rational, int)}, with the steps chosen for
     * {@code use} ({@link StepChooser}).
     *
     * @throws SingularCrossingException when a real singular point lies between the state's point and {@code to}
     */
    public static Carried walk(Equation equation, CarriedState start, Rational to, int precBits, StepChooser.Use use) {
        Equation eq = equation.reduced();
        RealPath.checkPath(eq, equation, start.x(), to);
        CarriedState state = start;
        int steps = 0;
        int terms = 0;
        int maxTerms = StepChooser.chooseMaxTerms(precBits);
        while (!state.x().equals(to)) {
            Recurrence rec = new Recurrence(eq, state.x());
            Rational remaining = to.subtract(state.x());
            Rational step = StepChooser.chooseStep(eq, rec, remaining, use);
            while (true) {
                try {
                    CarriedState.Stepped next = state.step(eq, rec, step, maxTerms, precBits);
                    state = next.state();
                    terms += next.terms();
                    break;
                } catch (LocalSeries.StepTooLongException e) {
                    step = step.divide(Rational.TWO);
                }
            }
            steps++;
        }
        return new Carried(state, steps, terms);
    }
}
