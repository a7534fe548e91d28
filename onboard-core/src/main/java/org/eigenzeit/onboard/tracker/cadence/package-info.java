/**
 * Frame cadence of the model: Earth rotation at every use, Sun, Moon and lunar pole every 60 s,
 * the Earth's precession-nutation every hour, each computed once per slot and cached.
 */
package org.eigenzeit.onboard.tracker.cadence;
