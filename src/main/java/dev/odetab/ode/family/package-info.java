/**
 * Built-in families, one per file: the equation of DLMF, the parameter ranges, and the
 * normalization at an ordinary point as exact constant expressions with their DLMF sources.
 */
package dev.odetab.ode.family;
