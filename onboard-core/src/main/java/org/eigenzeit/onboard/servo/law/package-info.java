/**
 * The steering law: pole-placement state feedback on the estimate, phase steps in acquisition,
 * quantisation, size and slew limits, and the accumulated steering phase.
 */
package org.eigenzeit.onboard.servo.law;
