/**
 * The physics of the product: the clock-rate model y = dtau/dT - 1 with its components, the
 * accumulated offset integrator, closed-form predictors and orbit bridging.
 */
package org.eigenzeit.onboard.relativity;
