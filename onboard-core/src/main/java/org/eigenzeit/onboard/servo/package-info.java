/**
 * The clock servo: {@link org.eigenzeit.onboard.servo.ClockServo} composes the measurement gate,
 * the Kalman estimator, the mode machine and the steering law into one cycle.
 */
package org.eigenzeit.onboard.servo;
