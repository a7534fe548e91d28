/**
 * Ground-side use of the core's instants: the core's {@code SplitTime} setters return a status
 * (no exceptions in flight code); ground code turns a refusal into an exception that says what
 * was refused, so no status is dropped on the ground either.
 */
package org.eigenzeit.ground.instant;
