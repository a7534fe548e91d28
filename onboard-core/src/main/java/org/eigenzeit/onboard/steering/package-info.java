/**
 * Clock steering: the Kalman estimator of the oscillator's phase, frequency and drift, the
 * steering law, the operating modes and the validation of time-offset measurements.
 */
package org.eigenzeit.onboard.steering;
