/**
 * Seeded-fault harness: applies each deliberate fault of {@code verification/faults.yaml} to a
 * scratch copy of the project, runs the tests named to catch it and records whether they failed
 * ({@code scripts/fault-check.sh}; docs/verification.md, "Seeded faults").
 */
package org.eigenzeit.verification.faults;
