package dev.odetab.series;

import dev.odetab.numeric.Ball;

/**
 * Enclosures of a solution and its first derivative at one point.
 *
 * @param value contains y(x)
 * @param derivative contains y'(x)
 */
public record Jet(Ball value, Ball derivative) {
}
