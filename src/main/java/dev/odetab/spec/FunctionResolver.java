package dev.odetab.spec;

import dev.odetab.base.InputError;

import dev.odetab.base.ExprException;
import dev.odetab.expr.ExprParser;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.ode.family.Family;
import dev.odetab.ode.family.ParameterException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Turns the FUNCTION argument of {@code eval} and {@code inspect} (a family name or
 * {@code SPEC#NAME}) and its {@code -p NAME=VALUE} options into a {@link FunctionDef}.
 */
public final class FunctionResolver {
    private FunctionResolver() {
    }

    /** One {@code -p NAME=VALUE} as typed, with its position among the arguments (1-based). */
    public record ParameterArg(String text, int argumentIndex) {
    }

    /**
     * @param function the FUNCTION argument
     * @param functionIndex its position among the arguments (for messages)
     * @param parameters the {@code -p} options in order
     */
    public static FunctionDef resolve(String function, int functionIndex, List<ParameterArg> parameters) throws InputError {
        int hash = function.lastIndexOf('#');
        if (hash >= 0) {
            if (!parameters.isEmpty()) {
                ParameterArg p = parameters.get(0);
                throw new InputError(InputError.argument(p.argumentIndex(), p.text(), 1),
                        "parameters (-p) apply to built-in families; a spec function takes its parameters from the spec");
            }
            SpecFile spec = SpecFile.load(Path.of(function.substring(0, hash)));
            return spec.function(function.substring(hash + 1));
        }
        Family family = Catalog.lookup(function).orElseThrow(() -> new InputError(
                InputError.argument(functionIndex, function, 1),
                "unknown function '" + function + "'" + Suggestions.hint(function, Catalog.names())
                        + " (built-in families: " + String.join(", ", Catalog.names()) + "; or SPEC#NAME for a spec function)"));
        Set<String> allowed = new LinkedHashSet<>();
        family.parameters().forEach(p -> allowed.add(p.name()));
        Map<String, Rational> values = new HashMap<>();
        Map<String, ParameterArg> origin = new HashMap<>();
        for (ParameterArg p : parameters) {
            int eq = p.text().indexOf('=');
            if (eq <= 0) {
                throw new InputError(InputError.argument(p.argumentIndex(), p.text(), 1), "expected NAME=VALUE, e.g. n=5");
            }
            String name = p.text().substring(0, eq).strip();
            if (!allowed.contains(name)) {
                throw new InputError(InputError.argument(p.argumentIndex(), p.text(), 1),
                        "unknown parameter '" + name + "' for " + family.name() + Suggestions.hint(name, allowed)
                                + (allowed.isEmpty() ? " (it takes none)" : " (its parameters: " + String.join(", ", allowed) + ")"));
            }
            if (values.containsKey(name)) {
                throw new InputError(InputError.argument(p.argumentIndex(), p.text(), 1), "parameter '" + name + "' is given twice");
            }
            String valueText = p.text().substring(eq + 1);
            try {
                Rational v = ExprParser.parseConstant(valueText, Map.of()).exact().orElse(null);
                if (v == null) {
                    throw new InputError(InputError.argument(p.argumentIndex(), p.text(), eq + 2),
                            "a parameter must be an exact rational, and '" + valueText + "' is not known to be one");
                }
                values.put(name, v);
                origin.put(name, p);
            } catch (ExprException e) {
                throw new InputError(InputError.argument(p.argumentIndex(), p.text(), eq + 1 + e.column()), e.getMessage());
            }
        }
        try {
            return family.define(values);
        } catch (ParameterException e) {
            ParameterArg p = e.parameter() == null ? null : origin.get(e.parameter());
            String where = p != null ? InputError.argument(p.argumentIndex(), p.text(), 1)
                    : InputError.argument(functionIndex, function, 1);
            throw new InputError(where, e.getMessage());
        }
    }
}
