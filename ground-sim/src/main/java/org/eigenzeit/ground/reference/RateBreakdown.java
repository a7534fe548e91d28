package org.eigenzeit.ground.reference;

/**
 * The reference's clock rate at one instant, by component (dimensionless), with the same
 * definitions as the onboard core's RateComponents: total = kinematic + gravitational +
 * harmonics + tidal + higherOrder.
 *
 * @param kinematic -v^2/(2c^2)
 * @param gravitational -(GM/r - W0)/c^2
 * @param harmonics -U_h/c^2
 * @param tidal -U_tid/c^2
 * @param higherOrder c^-4 terms (0 when off)
 * @param total y = dtau/dT - 1
 */
public record RateBreakdown(double kinematic, double gravitational, double harmonics, double tidal,
    double higherOrder, double total) {}
