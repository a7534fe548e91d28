/**
 * Lunar time on board: the content of the uplinked table that relates Eigenzeit's TT-like lunar
 * time TL to TT (a Chebyshev fit made on the ground along the JPL ephemeris), its pure content
 * validator, and its allocation-free evaluator.
 *
 * <p>Staging, CRC and activation are not here: a generic uplink-table mechanism wraps {@link
 * org.eigenzeit.onboard.lunartime.LunarTimeTable#validate} and {@link
 * org.eigenzeit.onboard.lunartime.LunarTimeTable#load} (two instances make the double buffer).
 */
package org.eigenzeit.onboard.lunartime;
