/**
 * Truth models of the closed loop: the oscillator's power-law noise, the steering actuator,
 * orbit-estimate errors and the time-offset measurement generator.
 */
package org.eigenzeit.ground.truth;
