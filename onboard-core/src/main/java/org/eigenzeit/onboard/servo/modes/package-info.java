/**
 * The servo's operating modes: named events and the transition table that moves the servo
 * between STANDBY, ACQUIRE, TRACK, COAST and SAFE.
 */
package org.eigenzeit.onboard.servo.modes;
