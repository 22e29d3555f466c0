package dev.odetab.cli;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.DecimalDigits;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.numeric.Precision;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.Start;
import dev.odetab.series.WalkCost;
import dev.odetab.ode.SingularCrossingException;
import dev.odetab.base.InputError;
import dev.odetab.spec.SpecFile;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code odetab eval FUNCTION X...}: one line per point, the point as given, a tab, the value. */
@Command(name = "eval", mixinStandardHelpOptions = true,
        description = {"Print the value (or the derivative) of a function at exact points, correctly rounded.",
            "X is an exact decimal (-7.25, 1e-3), a C99 hex float (0x1p-2, the x_hex column of a CSV) or a rational (1/3);",
            "it never goes through a binary double."})
final class EvalCommand implements Callable<Integer> {
    static final int DEFAULT_CAP_BITS = SpecFile.DEFAULT_PRECISION_CAP_BITS;
    static final int MAX_CAP_BITS = 1 << 20;
    /** Walks longer than this (in estimated steps) are announced on a terminal: a few seconds of work. */
    static final int ANNOUNCED_STEPS = 500;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FUNCTION", description = "a built-in family (airy-ai, ...) or SPEC#NAME")
    String function;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "X", description = "exact points: decimals, hex floats or rationals")
    List<String> points = new ArrayList<>();

    @Mixin
    FunctionOptions functionOptions;

    @Option(names = "--digits", paramLabel = "N", defaultValue = "20",
            description = "significant decimal digits, correctly rounded (default ${DEFAULT-VALUE})")
    int digits;

    @Option(names = "--format", paramLabel = "FMT",
            description = {"print the entry as a table in this format holds it: binary16|binary32|binary64|binary128|double-double|",
                "decimal:N|fixed:sT.F|fixed:uT.F. Fixed point: T bits in all (the sign included), F of them fraction bits;",
                "fixed:s16.15 is 16 bits with 15 fraction bits (Q-format Q0.15, \"Q15\"), fixed:u32.24 is UQ8.24."})
    String format;

    @Option(names = "--rounding", paramLabel = "MODE", defaultValue = "nearest-even",
            description = {"with --format: nearest-even (default, ties to even); toward-negative (never above the exact value;",
                "alias down); toward-positive (never below it; alias up); toward-zero (never larger in magnitude)"})
    String rounding;

    @Option(names = "--out-of-range", paramLabel = "POLICY", defaultValue = "error",
            description = "with a fixed-point --format: error (default) or saturate (the entry is flagged on stderr)")
    String outOfRange;

    @Option(names = "--derivative", description = "print y'(x) instead of y(x)")
    boolean derivative;

    @Option(names = "--precision-cap-bits", paramLabel = "BITS", defaultValue = "" + DEFAULT_CAP_BITS,
            description = "give up (exit 3) rather than work above this precision (default ${DEFAULT-VALUE})")
    int capBits;

    @Option(names = "--verbose", description = "report the work done on stderr: precision, attempts, steps, terms")
    boolean verbose;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            checkOptions();
            FunctionDef f = functionOptions.resolve(function);
            List<Rational> xs = new ArrayList<>();
            int from = 1;
            for (String p : points) {
                int index = CommandContext.indexOf(p, from);
                from = index + 1;
                xs.add(Points.parse(p, index));
            }
            if (format != null) {
                return printEntries(f, xs, out, err);
            }
            for (int i = 0; i < xs.size(); i++) {
                announceLongWalk(f, xs.get(i), points.get(i), err);
                FunctionEvaluator.Rounded r;
                try {
                    r = FunctionEvaluator.digits(f, xs.get(i), derivative, digits, capBits);
                } catch (PrecisionCapException e) {
                    throw new PointLimit(points.get(i), e);
                }
                out.println(points.get(i) + "\t" + DecimalDigits.format(r.value(), digits));
                if (verbose) {
                    err.println(Failures.work(points.get(i), r.exact(), r.precBits(), r.attempts(), r.steps(), r.terms()));
                }
            }
            return Main.OK;
        } catch (InputError | ExprException | SingularCrossingException e) {
            return Failures.badInput(e, function, err);
        } catch (PointLimit e) {
            PrecisionCapException cap = (PrecisionCapException) e.getCause();
            return Failures.numericalLimit(function + " at x = " + e.point + ": ", cap, cap.lastEnclosure() == null
                    ? "; nothing is printed for this point" // an estimate before any work, which names the cap
                    : "; nothing is printed for this point (" + capAdvice(cap) + ")", err);
        } finally {
            out.flush();
        }
    }

    /**
     * On a terminal, one line before a point whose walk is estimated ({@link WalkCost}) at more
     * than {@value #ANNOUNCED_STEPS} steps (some seconds of work), so that a slow point is never
     * silent; nothing on a pipe, so stderr of scripts is unchanged.
     */
    private static void announceLongWalk(FunctionDef f, Rational x, String point, PrintWriter err) throws ExprException {
        if (!ProgressDisplay.stderrIsTerminal() || FunctionEvaluator.polynomial(f).isPresent()) {
            return;
        }
        double steps = WalkCost.estimate(Start.of(f), x).steps();
        if (steps > ANNOUNCED_STEPS) {
            err.println("odetab: working: x = " + point + ", a walk of " + WalkCost.figure(steps) + " steps from x = "
                    + f.at() + " (the limit is " + (long) WalkCost.MAX_STEPS + ")");
            err.flush();
        }
    }

    /** What may still decide a point the cap left undecided. */
    private static String capAdvice(PrecisionCapException cap) {
        if (cap.lastEnclosure() != null && cap.lastEnclosure().containsZero()) {
            return "the enclosure still contains 0: if the value is exactly 0, no precision decides its sign under a directed"
                    + " rounding (use nearest-even); otherwise raise --precision-cap-bits, at most " + MAX_CAP_BITS;
        }
        return "raise --precision-cap-bits, at most " + MAX_CAP_BITS;
    }

    private Integer printEntries(FunctionDef f, List<Rational> xs, PrintWriter out, PrintWriter err)
            throws InputError, ExprException, PointLimit {
        Format fmt;
        try {
            fmt = Format.parse(format);
        } catch (IllegalArgumentException e) {
            throw new InputError(optionWhere("--format"), e.getMessage());
        }
        Optional<String> aboveCap = Precision.formatAboveCap(fmt, capBits);
        if (aboveCap.isPresent()) {
            boolean capGiven = spec.commandLine().getParseResult().hasMatchedOption("--precision-cap-bits");
            throw new InputError(optionWhere(capGiven ? "--precision-cap-bits" : "--format"), aboveCap.get());
        }
        Target target = new Target(fmt, roundingMode(), outOfRangePolicy());
        for (int i = 0; i < xs.size(); i++) {
            announceLongWalk(f, xs.get(i), points.get(i), err);
            FunctionEvaluator.Decided r;
            try {
                r = FunctionEvaluator.entry(f, xs.get(i), derivative, target, capBits);
            } catch (PrecisionCapException e) {
                throw new PointLimit(points.get(i), e);
            }
            Entry e = r.entry();
            if (e.kind() == Entry.Kind.OUT_OF_RANGE) {
                throw new InputError(InputError.argument(CommandContext.indexOf(points.get(i), 1), points.get(i), 1),
                        "the value at x = " + points.get(i) + " lies outside the range of " + fmt.name()
                                + " (use a wider format, or --out-of-range saturate)");
            }
            out.println(points.get(i) + "\t" + EntryText.of(e));
            if (e.kind() == Entry.Kind.SATURATED) {
                err.println("odetab: x = " + points.get(i) + ": saturated to the end of the range of " + fmt.name());
            }
            if (verbose) {
                err.println(Failures.work(points.get(i), r.exact(), r.precBits(), r.attempts(), r.steps(), r.terms()));
            }
        }
        return Main.OK;
    }

    /** The precision cap was reached at one point. */
    static final class PointLimit extends Exception {
        private static final long serialVersionUID = 1L;
        final String point;

        PointLimit(String point, PrecisionCapException cause) {
            super(cause.getMessage(), cause);
            this.point = point;
        }
    }

    private RoundingMode roundingMode() throws InputError {
        try {
            return RoundingMode.parse(rounding);
        } catch (IllegalArgumentException e) {
            throw new InputError(optionWhere("--rounding"), e.getMessage());
        }
    }

    private OutOfRange outOfRangePolicy() throws InputError {
        return switch (outOfRange) {
            case "error" -> OutOfRange.ERROR;
            case "saturate" -> OutOfRange.SATURATE;
            default -> throw new InputError(optionWhere("--out-of-range"), "expected error or saturate, got '" + outOfRange + "'");
        };
    }

    private void checkOptions() throws InputError {
        roundingMode();
        outOfRangePolicy();
        for (String option : List.of("--rounding", "--out-of-range")) {
            if (format == null && spec.commandLine().getParseResult().hasMatchedOption(option)) {
                throw new InputError(optionWhere(option), option + " applies only with --format (--digits rounds to nearest, ties to even)");
            }
        }
        if (capBits < 64 || capBits > MAX_CAP_BITS) {
            throw new InputError(optionWhere("--precision-cap-bits"),
                    "the precision cap must lie between 64 and " + MAX_CAP_BITS + " bits, got " + capBits);
        }
        if (digits < 1) {
            throw new InputError(optionWhere("--digits"), "--digits must be at least 1, got " + digits);
        }
        if (format != null && spec.commandLine().getParseResult().hasMatchedOption("--digits")) {
            throw new InputError(optionWhere("--digits"), "give either --digits or --format, not both");
        }
        int needed = Precision.bitsForDigits(digits) + 32;
        if (format == null && needed > capBits) {
            throw new InputError(optionWhere("--digits"), "--digits " + digits + " needs at least " + needed
                    + " bits of working precision, above the precision cap of " + capBits + " bits (raise it with --precision-cap-bits)");
        }
    }

    /** The position of an option's value ({@code --format binary99} → the argument after the option). */
    private static String optionWhere(String option) {
        int i = CommandContext.indexOf(option, 1);
        if (i == 0) {
            return "command line";
        }
        String value = CommandContext.at(i + 1);
        return value == null ? InputError.argument(i, option, 1) : InputError.argument(i + 1, value, 1);
    }
}
