/**
 * Earth orientation on board: the Earth Rotation Angle, a compact precession-nutation model and
 * the rotation of positions and velocities between the Earth-fixed frame (ITRS, as GNSS receivers
 * output) and the inertial frame (GCRS).
 */
package org.eigenzeit.onboard.frames;
