/**
 * The high-fidelity reference: orbit and proper time integrated together with Hipparchus, with
 * the geopotential by the Cunningham recursion, Sun and Moon from JPL DE405, radiation pressure
 * and drag; dense output for closed-loop use.
 */
package org.eigenzeit.ground.reference;
