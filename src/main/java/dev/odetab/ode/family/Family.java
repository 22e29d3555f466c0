package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;

/** A built-in family: a name from standard notation, its parameters, and how to build one member. *
 * <p>Derivation: docs/methods.md §7 (families and their normalizations).
 */
public interface Family {
    /** The name on the command line, e.g. {@code airy-ai}. */
    String name();

    /**
     * The equation in the notation of spec files, with the parameters by name (for example
     * {@code y'' - 2*x*y' + 2*n*y = 0}); with the parameters' values it reads as the equation
     * {@link #define} builds (FamilyEquationTest).
     */
    String equation();

    /** One line for help texts, with the DLMF section. */
    String title();

    /** The parameters in the order users expect them. */
    List<Parameter> parameters();

    /**
     * The member with these parameter values (every parameter of {@link #parameters()} is
     * present; unknown ones were rejected by the caller).
     *
     * @throws ParameterException when a value lies outside the allowed range (the message names the range)
     */
    FunctionDef define(Map<String, Rational> values) throws ParameterException;

    /** A parameter and the values it may take, in words ("an integer n >= 0"). */
    record Parameter(String name, String meaning, String allowed) {
    }
}
