package org.eigenzeit.ground.gnss;

import java.util.List;

/** Earth-fixed satellite states from a product: a precise orbit file, or the broadcast orbits. */
public interface OrbitSource {
  /** @return a short description for reports (file names) */
  String describe();

  /** @return the satellites with states */
  List<String> satellites();

  /**
   * The Earth-fixed state of a satellite.
   *
   * @param id satellite
   * @param gpsS GPS seconds since the GPS epoch
   * @param rE receives the position, m
   * @param vE receives the velocity, m/s
   * @return null when the state was written, otherwise why there is none
   */
  String state(String id, double gpsS, double[] rE, double[] vE);
}
