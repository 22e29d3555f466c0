/**
 * Auditing foreign tables: reading CSV files and C or Java array literals, measuring each entry
 * against an enclosure of the exact value in units in the last place, and writing the report.
 *
 * <p>Invariant: every entry value read here is the exact value a program holds after reading
 * the file (never a double approximation); every error decision against a tolerance is made
 * from a proven enclosure of the exact value, and is refined or reported, never guessed.
 */
package dev.odetab.audit;
