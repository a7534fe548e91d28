/**
 * The relativistic model of the onboard clock: {@link
 * org.eigenzeit.onboard.tracker.ProperTimeTracker} composes the sample validator, the orientation
 * cache, the rate model, the offset integrator and the outage bridge into one step per cycle.
 */
package org.eigenzeit.onboard.tracker;
