package dev.odetab.series;

import dev.odetab.numeric.Ball;
import java.util.Optional;
import java.util.function.Function;

/**
 * Ziv's strategy (METHODS §5; Ziv, ACM TOMS 17(3), 1991): evaluate an enclosure at some
 * precision, try to decide the rounding from it, and raise the precision until it is decided
 * or the cap is reached.
 *
 * <p>Trust level: Rigorous as long as {@code evaluate} returns true enclosures and
 * {@code decide} only answers when every point of the ball gives the same answer. The
 * precision schedule is a heuristic: it starts at {@code startBits}, then at least doubles the
 * working precision, or adds the bits the last enclosure was short of, whichever is more.
 */
public final class PrecisionLoop {
    private PrecisionLoop() {
    }

    /** An enclosure at a requested working precision; may fail with a checked exception. */
    @FunctionalInterface
    public interface BallSource<E extends Exception> {
        Ball at(int precBits) throws E;
    }

    /** The decided result, the precision that decided it and the number of evaluations. */
    public record Outcome<T>(T result, Ball enclosure, int precBits, int attempts) {
    }

    /**
     * @throws PrecisionCapException when the cap is reached undecided (the entry is never guessed)
     */
    public static <T, E extends Exception> Outcome<T> run(BallSource<E> evaluate, Function<Ball, Optional<T>> decide,
            int neededBits, int startBits, int capBits) throws E, PrecisionCapException {
        int prec = Math.min(startBits, capBits);
        int attempts = 0;
        while (true) {
            Ball b = evaluate.at(prec);
            attempts++;
            Optional<T> r = decide.apply(b);
            if (r.isPresent()) {
                return new Outcome<>(r.get(), b, prec, attempts);
            }
            if (prec >= capBits) {
                throw new PrecisionCapException(capBits, b);
            }
            int have = b.accuracyBitsEstimate();
            int shortBy = have == Integer.MIN_VALUE ? prec : Math.max(0, neededBits + 16 - have);
            prec = Math.min(capBits, Math.max(2 * prec, prec + shortBy + 32));
        }
    }
}
