/**
 * The model's orbit state across outages: the last good state propagated to the cycle time until
 * the bridging limit, the solution status and the rate error bound it implies.
 */
package org.eigenzeit.onboard.tracker.bridging;
