package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.time.SplitTime;

/**
 * Caller-owned holder of one orbit estimate: epoch (TT), frame, position and velocity, and the
 * producer's validity flag. Reused every cycle; nothing allocates after construction.
 *
 * <p>Frames: {@link #FRAME_BODY_FIXED} is the ITRS for the Earth (what GNSS receivers output;
 * velocity relative to the rotating frame) and is accepted only for the Earth;
 * {@link #FRAME_INERTIAL} is the GCRS for the Earth and the Moon-centred ICRF-aligned frame for
 * the Moon.
 *
 * <p>Mutable; one owner.
 */
public final class OrbitSample {
  /** Earth-fixed (ITRS) position and velocity relative to the rotating frame. */
  public static final int FRAME_BODY_FIXED = 0;
  /** Inertial (GCRS, or Moon-centred ICRF axes) position and velocity. */
  public static final int FRAME_INERTIAL = 1;

  private final SplitTime epochTt = new SplitTime();
  private final double[] positionM = new double[3];
  private final double[] velocityMPerS = new double[3];
  private int frame = FRAME_INERTIAL;
  private boolean valid;

  /** Creates an empty, invalid sample. */
  public OrbitSample() {
    // empty
  }

  /**
   * Sets the whole sample.
   *
   * @param epochTtIn epoch in TT (copied)
   * @param frameCode {@link #FRAME_BODY_FIXED} or {@link #FRAME_INERTIAL}
   * @param xM position x, m
   * @param yM position y, m
   * @param zM position z, m
   * @param vxMPerS velocity x, m/s
   * @param vyMPerS velocity y, m/s
   * @param vzMPerS velocity z, m/s
   * @param validFlag the producer's validity flag
   */
  public void set(SplitTime epochTtIn, int frameCode, double xM, double yM, double zM,
      double vxMPerS, double vyMPerS, double vzMPerS, boolean validFlag) {
    epochTt.setTo(epochTtIn);
    frame = frameCode;
    positionM[0] = xM;
    positionM[1] = yM;
    positionM[2] = zM;
    velocityMPerS[0] = vxMPerS;
    velocityMPerS[1] = vyMPerS;
    velocityMPerS[2] = vzMPerS;
    valid = validFlag;
  }

  /**
   * Copies the epoch.
   *
   * @param out receives the epoch in TT
   */
  public void epochTt(SplitTime out) {
    out.setTo(epochTt);
  }

  /**
   * Returns the frame code.
   *
   * @return the frame code
   */
  public int frame() {
    return frame;
  }

  /**
   * Returns the producer's validity flag.
   *
   * @return the producer's validity flag
   */
  public boolean valid() {
    return valid;
  }

  /**
   * Returns position component, m.
   *
   * @param axis 0, 1 or 2
   * @return position component, m
   */
  public double positionM(int axis) {
    return positionM[axis];
  }

  /**
   * Returns velocity component, m/s.
   *
   * @param axis 0, 1 or 2
   * @return velocity component, m/s
   */
  public double velocityMPerS(int axis) {
    return velocityMPerS[axis];
  }

  /**
   * Copies position and velocity as given.
   *
   * @param r receives the position, m
   * @param v receives the velocity, m/s
   */
  public void copyState(double[] r, double[] v) {
    r[0] = positionM[0];
    r[1] = positionM[1];
    r[2] = positionM[2];
    v[0] = velocityMPerS[0];
    v[1] = velocityMPerS[1];
    v[2] = velocityMPerS[2];
  }
}
