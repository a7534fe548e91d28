/**
 * The raw-clock gate of the clock corrector: backwards readings refused, repeated ones flagged, a
 * forward jump taken only when two consecutive readings confirm it; every verdict counted.
 */
package org.eigenzeit.onboard.corrector.rawclock;
