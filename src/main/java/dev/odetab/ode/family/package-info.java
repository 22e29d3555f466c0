/**
 * Built-in families, one per file: the equation of DLMF, the parameter ranges, and the
 * normalization at an ordinary point as exact constant expressions with their DLMF sources;
 * the orthogonal polynomial families also hold the data of their Gauss rules
 * ({@link dev.odetab.ode.family.OrthogonalFamily}).
 */
package dev.odetab.ode.family;
