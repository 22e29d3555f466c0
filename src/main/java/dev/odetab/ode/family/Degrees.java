package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;

/** Checks shared by families whose parameter is an integer degree. */
final class Degrees {
    private Degrees() {
    }

    static int integer(String name, Rational value, int min, int max) throws ParameterException {
        if (value == null) {
            throw new ParameterException(name, "missing parameter " + name + " (an integer " + min + " <= " + name + " <= " + max + ")");
        }
        if (!value.isInteger() || value.compareTo(Rational.of(min)) < 0 || value.compareTo(Rational.of(max)) > 0) {
            throw new ParameterException(name, name + " = " + value.toDecimalOrFraction() + " is outside the allowed range: an integer "
                    + min + " <= " + name + " <= " + max);
        }
        return value.numerator().intValueExact();
    }
}
