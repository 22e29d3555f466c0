package dev.odetab.series;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.ArrayList;
import java.util.List;

/**
 * Enclosures of a function at many points, reusing the work between neighbours: the solution
 * is continued from the normalization point to the nearest grid point, then from grid point
 * to grid point (docs/methods.md §4, dense grids), outward in both directions.
 *
 * <p>Trust level: Rigorous. Each leg is a {@link Continuation}, so every returned jet contains
 * the exact value and derivative at its point; the radius grows along the walk, and the caller
 * re-walks at a higher precision for the entries it cannot decide.
 */
public final class GridWalk {
    private GridWalk() {
    }

    /** The jets at the given points (any order, duplicates allowed), in the order given. */
    public static List<Jet> enclose(FunctionDef f, List<Rational> points, int precBits) throws ExprException {
        Jet[] result = new Jet[points.size()];
        var poly = FunctionEvaluator.polynomial(f);
        if (poly.isPresent()) {
            for (int i = 0; i < points.size(); i++) {
                Rational x = points.get(i);
                result[i] = new Jet(Ball.of(poly.get().evaluate(x), precBits), Ball.of(poly.get().derivative().evaluate(x), precBits));
            }
            return List.of(result);
        }
        Start begin = Start.of(f);
        CarriedState origin = Continuation.begin(begin, precBits);
        Jet start = begin.jet(precBits);
        List<Integer> up = new ArrayList<>();
        List<Integer> down = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            (points.get(i).compareTo(f.at()) >= 0 ? up : down).add(i);
        }
        up.sort((a, b) -> points.get(a).compareTo(points.get(b)));
        down.sort((a, b) -> points.get(b).compareTo(points.get(a)));
        for (List<Integer> leg : List.of(up, down)) {
            CarriedState state = origin;
            for (int i : leg) {
                Rational x = points.get(i);
                if (!x.equals(state.x())) {
                    state = Continuation.walk(f.equation(), state, x, precBits).state();
                }
                result[i] = x.equals(f.at()) ? start : state.jet();
            }
        }
        return List.of(result);
    }
}
