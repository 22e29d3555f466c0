package dev.odetab.ode;

import java.math.BigDecimal;

/**
 * The closed disk |z − (re + i·im)| &lt;= radius, used as an isolating enclosure of one root.
 *
 * <p>Trust level: Rigorous when produced by {@link SingularPoints}: the disk contains exactly
 * one distinct root of the reduced leading coefficient P2 and no other root of it. The tests
 * below are exact (BigDecimal products are exact, so no square root is taken).
 *
 * @param re     real part of the center
 * @param im     imaginary part of the center
 * @param radius radius, non-negative
 */
public record ComplexEnclosure(BigDecimal re, BigDecimal im, BigDecimal radius) {
    public ComplexEnclosure {
        if (radius.signum() < 0) {
            throw new IllegalArgumentException("negative radius " + radius);
        }
    }

    /** Exact: true when the point x + i·y lies in the closed disk. */
    public boolean contains(BigDecimal x, BigDecimal y) {
        BigDecimal dx = x.subtract(re);
        BigDecimal dy = y.subtract(im);
        return dx.multiply(dx).add(dy.multiply(dy)).compareTo(radius.multiply(radius)) <= 0;
    }

    /** Exact: true when the two closed disks have no point in common. */
    public boolean isDisjointFrom(ComplexEnclosure o) {
        BigDecimal dx = o.re.subtract(re);
        BigDecimal dy = o.im.subtract(im);
        BigDecimal r = radius.add(o.radius);
        return dx.multiply(dx).add(dy.multiply(dy)).compareTo(r.multiply(r)) > 0;
    }

    /** The mirror image of this disk in the real axis. */
    public ComplexEnclosure conjugate() {
        return new ComplexEnclosure(re, im.negate(), radius);
    }

    /** Exact: true when the disk lies strictly above or strictly below the real axis. */
    public boolean avoidsRealAxis() {
        return im.abs().compareTo(radius) > 0;
    }

    @Override
    public String toString() {
        return "D(" + re.toString() + (im.signum() < 0 ? " - " : " + ") + im.abs() + "i, " + radius + ")";
    }
}
