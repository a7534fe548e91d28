/**
 * Shared types of clock steering: the Kalman estimator of the oscillator's phase, frequency and
 * drift, the time-offset measurement holder and the mode codes.
 */
package org.eigenzeit.onboard.steering;
