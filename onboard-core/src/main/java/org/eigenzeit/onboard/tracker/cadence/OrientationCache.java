package org.eigenzeit.onboard.tracker.cadence;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.frames.LunarPole;
import org.eigenzeit.onboard.math.Vec3;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.relativity.ThirdBodies;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The frame cadence of the tracker: what changes slowly is computed once per slot of TT and
 * cached, what changes fast is computed at every use.
 *
 * <pre>
 *   every use          Earth Rotation Angle and the full GCRS-to-ITRS matrix (Earth, when a frame
 *                      conversion is needed: body-fixed input, or level HARMONICS)
 *   every 60 s slot    Sun and Moon (Earth and Sun for a lunar orbiter), the lunar pole
 *   every hour         the Earth's precession-nutation (celestial matrix and the pole in the GCRS)
 * </pre>
 *
 * Slots are aligned to whole minutes and hours of TT since J2000.0; the values of a slot are those
 * of its start, so the cache's content is a function of the slot alone (a refresh in the same slot
 * changes nothing). The CIP moves by less than 6e-8 rad in an hour (checked against IAU SOFA in
 * {@code EarthOrientationTest}), below the 1.4e-7 rad of the truncated nutation series.
 *
 * <p>State kept across a restart: the pole (the bridge reads it before the next refresh). The slot
 * markers are not saved: a restored cache recomputes the slot at its next use.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class OrientationCache {
  /** Cadence of the Sun, Moon and lunar pole, s. */
  public static final long SLOW_SLOT_S = 60L;
  /** Cadence of the Earth's precession-nutation, s (slots aligned to whole hours of TT). */
  public static final long ORIENTATION_SLOT_S = 3600L;
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 3 * 8;

  private static final double SECONDS_PER_CENTURY = 36_525.0 * SplitTime.SECONDS_PER_DAY;
  /** Largest departure of a restored pole from unit length. */
  private static final double UNIT_TOLERANCE = 1e-9;

  private final EarthOrientation orientation;
  private final LunarPole lunarPole;
  private final ThirdBodies bodies;
  private final boolean earth;
  private final boolean needsBodyFixed;
  private final double ut1MinusTtS;
  private final double[] pole = new double[3];
  private long slotStartS = Long.MIN_VALUE;
  private long orientationSlotStartS = Long.MIN_VALUE;

  /**
   * Creates the cache (nothing computed until the first {@link #refresh}).
   *
   * @param config the model configuration
   */
  public OrientationCache(ModelConfig config) {
    final CentralBody body = config.body();
    this.earth = body.centre() == CentralBody.CENTRE_EARTH;
    this.needsBodyFixed = earth && config.level() == ModelLevel.HARMONICS;
    this.orientation = new EarthOrientation(config.math(), body.rotationRateRadPerS());
    this.lunarPole = new LunarPole(config.math());
    this.bodies = new ThirdBodies(body, config.math(), config.tides());
    this.ut1MinusTtS = config.ut1MinusTtS();
    pole[2] = 1.0;
  }

  /**
   * Brings the slow terms to the slot of an instant (no work within the current 60 s slot).
   *
   * @param tt the instant in TT
   */
  public void refresh(SplitTime tt) {
    final long whole = tt.wholeSeconds();
    if (whole >= slotStartS && whole < slotStartS + SLOW_SLOT_S) {
      return; // same 60 s slot: no division on the common path
    }
    refreshSlot(whole);
  }

  /** Starts a new 60 s slot: third bodies, the lunar pole, and the Earth's pole once per hour. */
  private void refreshSlot(long whole) {
    final long s = Math.floorDiv(whole, SLOW_SLOT_S);
    slotStartS = s * SLOW_SLOT_S;
    final double slotStartSeconds = (double) s * (double) SLOW_SLOT_S;
    bodies.refresh(slotStartSeconds / SECONDS_PER_CENTURY);
    if (!earth) {
      lunarPole.pole(slotStartSeconds / SplitTime.SECONDS_PER_DAY, pole);
    } else if (!(whole >= orientationSlotStartS && whole < orientationSlotStartS + ORIENTATION_SLOT_S)) {
      final long h = Math.floorDiv(whole, ORIENTATION_SLOT_S);
      orientationSlotStartS = h * ORIENTATION_SLOT_S;
      orientation.updateCelestial((double) orientationSlotStartS / SECONDS_PER_CENTURY);
      orientation.poleInGcrs(pole);
    }
  }

  /**
   * Whether a sample in this frame needs no frame work (Earth, inertial, below level HARMONICS):
   * its inertial state is the sample itself and no body-fixed position is needed.
   *
   * @param frame an {@code OrbitSample.FRAME_*} code
   * @return true when no conversion is needed
   */
  public boolean isDirect(int frame) {
    return earth && frame == OrbitSample.FRAME_INERTIAL && !needsBodyFixed;
  }

  /**
   * Converts a validated sample's state to the inertial frame and to the body-fixed position the
   * model needs, at the sample's epoch (refreshes the slot first). A direct frame ({@link
   * #isDirect}) is copied.
   *
   * @param epochTt the sample's epoch
   * @param frame its frame code (body-fixed only for the Earth)
   * @param r position as given, m
   * @param v velocity as given, m/s
   * @param rInertialOut receives the inertial position, m
   * @param vInertialOut receives the inertial velocity, m/s
   * @param rBodyFixedOut receives the body-fixed position, m (left alone for a direct frame)
   */
  public void toInertial(SplitTime epochTt, int frame, double[] r, double[] v, double[] rInertialOut,
      double[] vInertialOut, double[] rBodyFixedOut) {
    refresh(epochTt);
    if (isDirect(frame)) {
      Vec3.copy(r, rInertialOut);
      Vec3.copy(v, vInertialOut);
      return;
    }
    if (earth) {
      orientation.updateRotation(epochTt, ut1MinusTtS);
      if (frame == OrbitSample.FRAME_BODY_FIXED) {
        Vec3.copy(r, rBodyFixedOut);
        orientation.positionToGcrs(r, rInertialOut);
        orientation.velocityToGcrs(r, v, vInertialOut);
      } else {
        Vec3.copy(r, rInertialOut);
        Vec3.copy(v, vInertialOut);
        orientation.positionToItrs(r, rBodyFixedOut);
      }
    } else {
      Vec3.copy(r, rInertialOut);
      Vec3.copy(v, vInertialOut);
      Vec3.copy(r, rBodyFixedOut);
    }
  }

  /**
   * The body-fixed position of an inertial position at an instant (refreshes the slot first):
   * rotated for the Earth at level HARMONICS, the same vector for the Moon, untouched otherwise.
   *
   * @param tt the instant in TT
   * @param rInertial inertial position, m
   * @param rBodyFixedOut receives the body-fixed position, m
   */
  public void bodyFixed(SplitTime tt, double[] rInertial, double[] rBodyFixedOut) {
    refresh(tt);
    if (earth) {
      if (needsBodyFixed) {
        orientation.updateRotation(tt, ut1MinusTtS);
        orientation.positionToItrs(rInertial, rBodyFixedOut);
      }
    } else {
      Vec3.copy(rInertial, rBodyFixedOut);
    }
  }

  /**
   * Copies the rotation pole of the body in the inertial frame at the last refresh.
   *
   * @param out receives the unit vector
   */
  public void pole(double[] out) {
    Vec3.copy(pole, out);
  }

  /**
   * The third-body positions of the current slot (read only).
   *
   * @return the cache's own holder
   */
  public ThirdBodies bodies() {
    return bodies;
  }

  /**
   * Writes the pole.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    for (int i = 0; i < 3; i++) {
      w.putDouble(pole[i]);
    }
  }

  /**
   * Restores the pole (a unit vector within 1e-9) and forgets the slot, so that the next use
   * recomputes it.
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    final int at = r.position();
    for (int i = 0; i < 3; i++) {
      pole[i] = r.getDoubleIn(-1.0, 1.0);
    }
    if (!(Math.abs(Vec3.norm(pole) - 1.0) <= UNIT_TOLERANCE)) {
      r.refuse(at);
    }
    slotStartS = Long.MIN_VALUE;
    orientationSlotStartS = Long.MIN_VALUE;
  }
}
