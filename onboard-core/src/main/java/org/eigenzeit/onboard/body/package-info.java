/**
 * Central bodies as immutable data: gravitational parameter, reference radius, J2, rotation rate
 * and the reference potential that defines the time scale realised on or near that body.
 */
package org.eigenzeit.onboard.body;
