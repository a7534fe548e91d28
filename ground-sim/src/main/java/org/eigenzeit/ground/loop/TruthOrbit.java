package org.eigenzeit.ground.loop;

/** The true orbit and proper time of a run: from the reference propagator or an external file. */
public interface TruthOrbit {
  /**
   * Inertial state.
   *
   * @param t seconds from the run start
   * @param r receives the position, m
   * @param v receives the velocity, m/s
   */
  void state(double t, double[] r, double[] v);

  /**
   * True proper-time offset tau - T_scale accumulated from the start.
   *
   * @param t seconds from the run start
   * @return the offset, s
   */
  double properTimeOffsetS(double t);
}
