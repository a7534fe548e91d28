package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;

/**
 * Caller-owned holder of one evaluation of the clock-rate model, each component a dimensionless
 * fractional frequency (seconds per second), so that {@code total = kinematic + gravitational +
 * harmonics + tidal + higherOrder}.
 *
 * <ul>
 *   <li>{@code kinematic = -v^2 / (2 c^2)} (inertial speed, second-order Doppler);
 *   <li>{@code gravitational = -(GM/r - W0) / c^2} (monopole against the reference potential);
 *   <li>{@code harmonics = -U_h / c^2} (J2, or zonal and tesseral terms to the set degree);
 *   <li>{@code tidal = -U_tid / c^2} (Sun and Moon, or Earth and Sun for a lunar orbiter);
 *   <li>{@code higherOrder}: the c^-4 terms when enabled, else 0.
 * </ul>
 *
 * <p>Also carries {@code rDotVM2PerS} (r.v, inertial) and {@code integrandRate} (the smooth
 * integrand of the offset integrator). Mutable; one owner.
 */
public final class RateComponents {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 8 * 8;

  double kinematic;
  double gravitational;
  double harmonics;
  double tidal;
  double higherOrder;
  double total;
  double rDotVM2PerS;
  double integrandRate;

  /** Creates a zeroed holder. */
  public RateComponents() {
    // zero
  }

  /**
   * Returns -v^2/(2c^2).
   *
   * @return -v^2/(2c^2)
   */
  public double kinematic() {
    return kinematic;
  }

  /**
   * Returns -(GM/r - W0)/c^2.
   *
   * @return -(GM/r - W0)/c^2
   */
  public double gravitational() {
    return gravitational;
  }

  /**
   * Returns -U_h/c^2.
   *
   * @return -U_h/c^2
   */
  public double harmonics() {
    return harmonics;
  }

  /**
   * Returns -U_tid/c^2.
   *
   * @return -U_tid/c^2
   */
  public double tidal() {
    return tidal;
  }

  /**
   * Returns the c^-4 contribution (0 when disabled).
   *
   * @return the c^-4 contribution (0 when disabled)
   */
  public double higherOrder() {
    return higherOrder;
  }

  /**
   * Returns y = dtau/dT - 1, the sum of the components.
   *
   * @return y = dtau/dT - 1, the sum of the components
   */
  public double total() {
    return total;
  }

  /**
   * Returns r . v in the inertial frame, m^2/s.
   *
   * @return r . v in the inertial frame, m^2/s
   */
  public double rDotVM2PerS() {
    return rDotVM2PerS;
  }

  /**
   * Returns the integrand g = y + 2 (v^2 + r . a)/c^2 of the offset integrator.
   *
   * @return the integrand g = y + 2 (v^2 + r . a)/c^2 of the offset integrator
   */
  public double integrandRate() {
    return integrandRate;
  }

  /**
   * Copies another holder.
   *
   * @param o source
   */
  public void setTo(RateComponents o) {
    kinematic = o.kinematic;
    gravitational = o.gravitational;
    harmonics = o.harmonics;
    tidal = o.tidal;
    higherOrder = o.higherOrder;
    total = o.total;
    rDotVM2PerS = o.rDotVM2PerS;
    integrandRate = o.integrandRate;
  }

  /**
   * Writes the eight values.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    w.putDouble(kinematic);
    w.putDouble(gravitational);
    w.putDouble(harmonics);
    w.putDouble(tidal);
    w.putDouble(higherOrder);
    w.putDouble(total);
    w.putDouble(rDotVM2PerS);
    w.putDouble(integrandRate);
  }

  /**
   * Restores the eight values, each finite and bounded.
   *
   * @param r the reader (refusals latch in it)
   * @param maxRate largest |rate| accepted for each rate value
   * @param maxRDotV largest |r.v| accepted, m^2/s
   */
  public void restore(StateReader r, double maxRate, double maxRDotV) {
    kinematic = r.getDoubleIn(-maxRate, maxRate);
    gravitational = r.getDoubleIn(-maxRate, maxRate);
    harmonics = r.getDoubleIn(-maxRate, maxRate);
    tidal = r.getDoubleIn(-maxRate, maxRate);
    higherOrder = r.getDoubleIn(-maxRate, maxRate);
    total = r.getDoubleIn(-maxRate, maxRate);
    rDotVM2PerS = r.getDoubleIn(-maxRDotV, maxRDotV);
    integrandRate = r.getDoubleIn(-maxRate, maxRate);
  }
}
