/**
 * The ground reference side by side with a general-purpose flight-dynamics library (Orekit,
 * benchmark scope only) doing the same work: same coefficients, same Sun and Moon, same Earth
 * rotation, same integrator and tolerances (docs/performance.md, "The reference against a peer").
 */
package org.eigenzeit.bench.peer;
