/**
 * The servo's measurement gate: validation of time-offset measurements, the innovation gate and
 * the detection of phase jumps from consistent outliers.
 */
package org.eigenzeit.onboard.servo.gate;
