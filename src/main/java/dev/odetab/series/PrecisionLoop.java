package dev.odetab.series;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Format;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.Supplier;

/**
 * Ziv's strategy (docs/methods.md §5; Ziv, ACM TOMS 17(3), 1991), the one loop that raises the working
 * precision until an answer is decided: evaluate enclosures at some precision, decide what they
 * allow, and go again at a higher precision for the rest, until everything is decided or the cap
 * is reached ({@link PrecisionCapException}, never a guess).
 *
 * <p>Trust level: Rigorous as long as the evaluations return true enclosures and the decisions
 * only answer when every point of a ball gives the same answer. The precision schedule is a
 * heuristic and has two forms. For one value ({@link #run}) it at least doubles the working
 * precision, or adds the bits the last enclosure was short of, whichever is more. For a batch
 * of rows that share one walk ({@link #runBatch}), or a search whose failures say no more than
 * "not yet" ({@link #raise}), it doubles, up to the cap.
 *
 * <p>The starting rule ({@link #chooseStartBits}): the bits the format holds plus {@value #GUARD_BITS} guard bits, enough that rounding decides at
 * the first try except near rounding boundaries. Two callers keep their own offsets, since the
 * precision they reach is part of what they print: the audit (+30, recorded in its reports) and
 * {@code eval --digits} (+32 over the digits' bits).
 */
public final class PrecisionLoop {
    /** Guard bits above the format's own where a loop starts (a heuristic). */
    public static final int GUARD_BITS = 40;

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
     * Heuristic: where a loop for entries of format {@code f} starts: the bits it holds
     * ({@link Format#significantBits}) + {@value #GUARD_BITS}.
     */
    public static int chooseStartBits(Format f) {
        return f.significantBits() + GUARD_BITS;
    }

    /**
     * One value: evaluates at {@code min(startBits, capBits)} and then by the schedule of the
     * class comment until {@code decide} answers.
     *
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

    /**
     * One round of a batch: decide (and keep) what the enclosures at {@code precBits} allow of
     * {@code pending}, and return the items still undecided, in order.
     */
    @FunctionalInterface
    public interface Round<K, E1 extends Exception, E2 extends Exception> {
        List<K> decide(List<K> pending, int precBits) throws E1, E2;
    }

    /**
     * A batch: the first round at {@code min(startBits, capBits)} (a first attempt never exceeds
     * the cap), then rounds over the undecided items only, at doubled precision, up to the cap.
     *
     * @param capMessage what stays undecided, for the cap exception (it names the items)
     * @return the precision of the last round
     * @throws PrecisionCapException when items are still undecided at the cap
     */
    public static <K, E1 extends Exception, E2 extends Exception> int runBatch(List<K> items, Round<K, E1, E2> round,
            int startBits, int capBits, Function<List<K>, String> capMessage) throws E1, E2, PrecisionCapException {
        List<K> pending = items;
        int prec = Math.min(startBits, capBits);
        while (true) {
            List<K> still = round.decide(pending, prec);
            if (still.isEmpty()) {
                return prec;
            }
            prec = raise(prec, capBits, () -> capMessage.apply(still));
            pending = still;
        }
    }

    /**
     * Heuristic: the next precision of the doubling schedule, at most the cap.
     *
     * @param message what the cap leaves undecided, asked only when {@code precBits} is already at the cap
     * @throws PrecisionCapException when {@code precBits} is at (or above) the cap
     */
    public static int raise(int precBits, int capBits, Supplier<String> message) throws PrecisionCapException {
        if (precBits >= capBits) {
            throw new PrecisionCapException(message.get(), capBits);
        }
        return Math.min(capBits, 2 * precBits);
    }
}
