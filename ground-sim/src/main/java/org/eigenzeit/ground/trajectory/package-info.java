/**
 * External trajectories: CCSDS OEM (KVN), SP3-c/d and RINEX 2 GPS navigation files, Lagrange
 * interpolation, and the proper-time reference along an external trajectory.
 */
package org.eigenzeit.ground.trajectory;
