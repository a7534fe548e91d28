/**
 * Strict reading of text input from outside (orbit files, navigation files, clock files,
 * scenarios, command-line values): ASCII-only lines, decimal numbers that must be finite and in
 * range, whole numbers without fractions, calendar fields that must exist. Every refusal is an
 * {@link org.eigenzeit.ground.input.InputException} whose message reads
 * {@code source:line: what, found '...', allowed ...}, so the user can go to the place.
 */
package org.eigenzeit.ground.input;
