package dev.odetab.tables;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Rational;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.tables.quadrature.GaussPolynomial;
import java.util.Optional;

/**
 * What a table is: the spec's {@code kind}, with what each kind needs to find its rows. One record
 * per kind; each is evaluated by its own evaluator in a sub-package of {@code tables} (values
 * tables by {@code values.ValuesEvaluator}, taylor tables by {@code values.TaylorEvaluator}, which
 * shares its chunk machinery, zeros by {@code zeros.ZeroFinder}, quadrature by
 * {@code quadrature.GaussRule}), reached through {@link #evaluate}: a new kind is a new record
 * here, a new method of {@link Evaluators} (so the compiler lists the dispatch that must handle
 * it), its evaluator and its spec section.
 */
public sealed interface TableKind {
    /** One evaluation per kind: the calls {@link #evaluate} dispatches to. */
    interface Evaluators {
        TableResult values(TableDef t, Values kind) throws ExprException, PrecisionCapException, OutOfRangeException;

        TableResult taylor(TableDef t, Taylor kind) throws ExprException, PrecisionCapException, OutOfRangeException;

        TableResult zeros(TableDef t, Zeros kind) throws ExprException, PrecisionCapException, OutOfRangeException;

        TableResult quadrature(TableDef t, Quadrature kind) throws ExprException, PrecisionCapException, OutOfRangeException;
    }

    /** The table {@code t} (of this kind) evaluated by the evaluator of this kind among {@code e}. */
    TableResult evaluate(TableDef t, Evaluators e) throws ExprException, PrecisionCapException, OutOfRangeException;

    /**
     * The grid of a kind whose points are given (values, taylor); empty for a kind whose points
     * are found by the evaluation (zeros, Gauss nodes): there are none before it, and they are
     * irrational in general, so the table holds each correctly rounded.
     */
    Optional<Grid> givenPoints();

    /**
     * The number of rows as far as the spec tells it, before evaluation: the grid's size, the
     * nodes of a rule, the {@code count} of a zeros table (0 when not given: known only after the
     * search).
     */
    long rowsBeforeEvaluation();

    /** One line for provenance: where the rows' points come from. */
    String describe();

    /** A kind whose rows are the given points of a grid. */
    sealed interface OnGrid extends TableKind permits Values, Taylor {
        Grid grid();

        @Override
        default Optional<Grid> givenPoints() {
            return Optional.of(grid());
        }

        @Override
        default long rowsBeforeEvaluation() {
            return grid().size();
        }

        @Override
        default String describe() {
            return grid().describe();
        }
    }

    /** A kind whose points are found by the evaluation (zeros, Gauss nodes), so it has no grid. */
    sealed interface Found extends TableKind permits Zeros, Quadrature {
        @Override
        default Optional<Grid> givenPoints() {
            return Optional.empty();
        }
    }

    /** A values table: y and its derivatives at the points of a grid. */
    record Values(Grid grid) implements OnGrid {
        @Override
        public TableResult evaluate(TableDef t, Evaluators e) throws ExprException, PrecisionCapException, OutOfRangeException {
            return e.values(t, this);
        }
    }

    /** A taylor table: the first {@code terms} Taylor coefficients y^(k)(x)/k! at each point of a grid. */
    record Taylor(Grid grid, int terms) implements OnGrid {
        @Override
        public TableResult evaluate(TableDef t, Evaluators e) throws ExprException, PrecisionCapException, OutOfRangeException {
            return e.taylor(t, this);
        }
    }

    /**
     * A zeros table: the zeros of y (or of y' when {@code ofDerivative}) met walking from
     * {@code from} to {@code to}, at most {@code count} of them (0: all).
     */
    record Zeros(Rational from, Rational to, int count, boolean ofDerivative) implements Found {
        @Override
        public TableResult evaluate(TableDef t, Evaluators e) throws ExprException, PrecisionCapException, OutOfRangeException {
            return e.zeros(t, this);
        }

        @Override
        public long rowsBeforeEvaluation() {
            return count;
        }

        @Override
        public String describe() {
            return "zeros of " + (ofDerivative ? "y'" : "y") + " met walking from " + from.toDecimalOrFraction() + " to "
                    + to.toDecimalOrFraction() + " (both ends included)" + (count > 0 ? ", the first " + count : "");
        }
    }

    /**
     * A quadrature table: the n nodes of a Gauss rule and their weights.
     *
     * @param rule the rule: the family's polynomial p_n, whose zeros are the nodes
     * @param flushUnderflow true when a weight below the format's smallest normal number is
     *     written as 0 and flagged (weight_underflow = "flush"); false when it is an error
     */
    record Quadrature(GaussPolynomial rule, boolean flushUnderflow) implements Found {
        @Override
        public TableResult evaluate(TableDef t, Evaluators e) throws ExprException, PrecisionCapException, OutOfRangeException {
            return e.quadrature(t, this);
        }

        @Override
        public long rowsBeforeEvaluation() {
            return rule.n();
        }

        @Override
        public String describe() {
            return rule.describe() + "; nodes ascending, each zero of p_" + rule.n()
                    + " proven by interval Newton from an exact center, all " + rule.n() + " counted by disjoint enclosures"
                    + (flushUnderflow ? "; weights below the smallest normal number flushed to 0 and flagged in weight_flag" : "");
        }
    }
}
