/**
 * The equation P2 y'' + P1 y' + P0 y = 0 with exact rational polynomial coefficients, its
 * singular points (complex roots of the reduced P2, enclosed in disks that each provably hold
 * exactly one root), their Fuchs classification, the guaranteed radius of convergence, and
 * the family catalog (one family per file in {@code ode.family}).
 *
 * <p>Invariant: classifications are exact (polynomial gcds); every root disk and every radius
 * returned is rigorous (a radius is a lower bound).
 */
package dev.odetab.ode;
