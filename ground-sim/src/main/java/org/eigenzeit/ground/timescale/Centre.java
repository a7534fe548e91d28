package org.eigenzeit.ground.timescale;

/** Where an event lies when its coordinates in the local time scales are compared. */
public enum Centre {
  /** The geocentre: TT, TCG and TDB as IAU SOFA's {@code dtdb} computes them with u = v = 0. */
  EARTH,
  /** The selenocentre: the event at which TL - TT is quoted (Turyshev et al. 2024). */
  MOON
}
