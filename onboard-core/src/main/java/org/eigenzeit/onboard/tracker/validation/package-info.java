/**
 * Validation of orbit samples before they reach the model: pure checks of the producer flag,
 * frame, finiteness, radius, epoch, speed and orbital energy, first failure wins.
 */
package org.eigenzeit.onboard.tracker.validation;
