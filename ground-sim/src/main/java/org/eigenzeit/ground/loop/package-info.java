/**
 * The closed loop: the onboard clock corrector called exactly as flight software calls it, once per
 * cycle, with the truth (orbit, proper time, oscillator, actuator, measurements) from the ground
 * reference and the truth models.
 */
package org.eigenzeit.ground.loop;
