/**
 * The proper-time offset integrator: the exact periodic term -2 r.v/c^2 plus a third-order,
 * compensated quadrature of the smooth remainder, node by node.
 */
package org.eigenzeit.onboard.tracker.integration;
