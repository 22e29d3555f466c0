package dev.odetab.cli;

import dev.odetab.expr.ConstExpr;
import dev.odetab.expr.ConstSimplify;
import dev.odetab.base.ExprException;
import dev.odetab.expr.Poly;
import dev.odetab.expr.RationalFunction;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.DecimalDigits;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.SingularPoint;
import dev.odetab.ode.SingularPoints;
import dev.odetab.series.Inspection;
import dev.odetab.ode.SingularCrossingException;
import dev.odetab.base.InputError;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code odetab inspect FUNCTION}: the equation in normal form, its singular points and their
 * kind, the guaranteed radius of convergence, the coefficient recurrence and the first Taylor
 * coefficients at a point.
 */
@Command(name = "inspect", mixinStandardHelpOptions = true,
        description = "Show the equation of a function, its singular points, the radius of convergence, the recurrence and Taylor coefficients.")
final class InspectCommand implements Callable<Integer> {
    private static final int COEFFICIENTS = 8;
    private static final int SHOW_DIGITS = 20;
    private static final int WORK_BITS = 128;
    /** Exact polynomials up to this degree are printed in full. */
    private static final int MAX_SHOWN_DEGREE = 12;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FUNCTION", description = "a built-in family (airy-ai, ...) or SPEC#NAME")
    String function;

    @Mixin
    FunctionOptions functionOptions;

    @Option(names = "--at", paramLabel = "X", description = "the point for the radius, the recurrence and the coefficients (default: the normalization point)")
    String at;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            FunctionDef f = functionOptions.resolve(function);
            Rational x = at == null ? f.at() : Points.parse(at, CommandContext.indexOf(at, 1));
            Equation eq = f.equation();
            Equation reduced = eq.reduced();
            if (!reduced.isOrdinary(x)) {
                throw new InputError(InputError.argument(CommandContext.indexOf(at, 1), at, 1),
                        "x = " + x.toDecimalOrFraction() + " is a singular point of the equation; choose an ordinary point");
            }
            out.println("function        " + f.name() + (f.parameters().isEmpty() ? "" : "  " + parameters(f)));
            out.println("source          " + f.source());
            out.println("equation        " + eq);
            out.println("normal form     y'' + p(x)*y' + q(x)*y = 0");
            out.println("                p(x) = " + RationalFunction.of(reduced.p1(), reduced.p2()));
            out.println("                q(x) = " + RationalFunction.of(reduced.p0(), reduced.p2()));
            List<SingularPoint> sing = SingularPoints.of(eq);
            if (sing.isEmpty()) {
                out.println("singular points none in the complex plane (the coefficient of y'' has no root)");
            } else {
                out.println("singular points " + sing.size());
                for (SingularPoint s : sing) {
                    out.println("                " + s);
                }
            }
            out.println("normalization   y(" + f.at().toDecimalOrFraction() + ") = " + constant(f.value()));
            out.println("                y'(" + f.at().toDecimalOrFraction() + ") = " + constant(f.slope()));
            Optional<Inspection.Terminating> exact = Inspection.terminating(f);
            if (exact.isPresent()) {
                Poly poly = exact.get().polynomial();
                out.println("exact           polynomial of degree " + poly.degree() + ": the series terminates (" + exact.get().order()
                        + " consecutive zero coefficients), so values are exact rationals rounded once");
                if (poly.degree() <= MAX_SHOWN_DEGREE) {
                    out.println("                y = " + poly);
                }
            }
            BigDecimal radius = SingularPoints.radiusLowerBound(eq, x);
            out.println("radius          " + (radius == null
                    ? "infinite at x = " + x.toDecimalOrFraction() + ": every solution is entire (no singular point)"
                    : ">= " + radius.stripTrailingZeros().toPlainString() + " at x = " + x.toDecimalOrFraction()
                            + " (distance to the nearest singular point, rounded down)"));
            out.println("recurrence      with t = x - " + x.toDecimalOrFraction() + ", y = sum c(m)*t^m, for m >= 2:");
            out.println("                " + Inspection.recurrence(eq, x));
            List<Inspection.Coefficient> c = Inspection.coefficients(f, x, COEFFICIENTS, SHOW_DIGITS, WORK_BITS);
            out.println("taylor          first " + COEFFICIENTS + " coefficients at x = " + x.toDecimalOrFraction()
                    + ", correctly rounded to " + SHOW_DIGITS + " digits (or the enclosure when it cannot decide them)");
            for (int m = 0; m < c.size(); m++) {
                out.println("                c(" + m + ") = " + c.get(m).rounded().map(v -> DecimalDigits.format(v, SHOW_DIGITS))
                        .orElse(c.get(m).enclosure().toString()));
            }
            return Main.OK;
        } catch (InputError | ExprException | SingularCrossingException e) {
            return Failures.badInput(e, function, err);
        } finally {
            out.flush();
        }
    }

    private static String parameters(FunctionDef f) {
        StringBuilder sb = new StringBuilder();
        f.parameters().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey()).append(" = ").append(e.getValue().toDecimalOrFraction()));
        return sb.toString();
    }

    /** The expression, and its value when the expression is not already a plain number. */
    private static String constant(ConstExpr e) throws ExprException {
        String value = show(e.evaluate(WORK_BITS));
        ConstExpr shown = ConstSimplify.of(e);
        return shown instanceof ConstExpr.Number ? value : shown + " = " + value;
    }

    /** Correctly rounded to 20 digits when the enclosure decides it, else the enclosure itself. */
    private static String show(Ball b) {
        return DecimalDigits.round(b, SHOW_DIGITS).map(v -> DecimalDigits.format(v, SHOW_DIGITS)).orElse(b.toString());
    }
}
