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
 * <p><b>Staging (a bounded worst cycle).</b> The next slots' values are computed ahead, a slice per
 * cycle, into staging storage beside the values in use (a double buffer): every cycle does at
 * most {@link #STEPS_PER_CYCLE} steps (none in a cycle that computed a slot at once), first the next 60 s slot's Sun, Moon and
 * lunar pole ({@link ThirdBodies#prepareStep}, 0 to 3 steps), then the next hour's
 * precession-nutation ({@link EarthOrientation#celestialStep}, {@link
 * EarthOrientation#CELESTIAL_STEPS} steps). At a new slot the staged values are installed when
 * they are complete and were staged for exactly that slot, with the same inputs the synchronous
 * refresh takes (the slot's start), so every number is bit-identical to computing them at the
 * slot; otherwise (first use, restart, outage or jump across slots, time going back, cycles too
 * far apart) the slot is computed at once as before, and {@link #synchronousRefreshes} counts it.
 * Cost of one step (instrumented count, docs/performance.md): at most two sine/cosine pairs or two
 * arc tangents and about 60 operations for the Earth's matrix; the Sun about 5 sine/cosine, the
 * Moon about 35 and the lunar pole about 20 (with tides or on the Moon only).
 *
 * <p>State kept across a restart: the pole (the bridge reads it before the next refresh). The slot
 * markers and the staging are not saved: a restored cache recomputes the slot at its next use.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class OrientationCache {
  /** Cadence of the Sun, Moon and lunar pole, s. */
  public static final long SLOW_SLOT_S = 60L;
  /** Cadence of the Earth's precession-nutation, s (slots aligned to whole hours of TT). */
  public static final long ORIENTATION_SLOT_S = 3600L;
  /**
   * Staging steps done per cycle within a slot (the slice size): the bound on the extra work of a
   * cycle is this many steps (class comment). One step per cycle finishes the Earth's hour in 17
   * cycles and a minute's bodies in 2 or 3.
   */
  public static final int STEPS_PER_CYCLE = 1;
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
  private long slotIndex = Long.MIN_VALUE;
  private long orientationSlotStartS = Long.MIN_VALUE;
  // Staging of the next slots (see the class comment): steps done for slot slotIndex + 1 and for
  // the hour after orientationSlotStartS; the staged values live in the components themselves.
  private final int slowSteps;
  private int slowStep;
  private int hourStep;
  private final double[] stagedLunarPole = new double[3];
  private int synchronousRefreshes;

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
    this.slowSteps = bodies.steps() + (earth ? 0 : 1);
    pole[2] = 1.0;
  }

  /**
   * Brings the slow terms to the slot of an instant, then does at most {@link #STEPS_PER_CYCLE}
   * steps of the next slots' values (the staging described in the class comment), except in a
   * cycle that computed a slot at once.
   *
   * @param tt the instant in TT
   */
  public void refresh(SplitTime tt) {
    final long whole = tt.wholeSeconds();
    // same 60 s slot: no division on the common path
    if (!(whole >= slotStartS && whole < slotStartS + SLOW_SLOT_S) && refreshSlot(whole)) {
      return; // this cycle computed a slot at once: no staging on top
    }
    for (int k = 0; k < STEPS_PER_CYCLE; k++) {
      if (!stageStep()) {
        break;
      }
    }
  }

  /**
   * One step of staging: first the next 60 s slot's bodies (and lunar pole), then the next hour's
   * precession-nutation; each with the inputs {@link #refreshSlot} would give it at that slot.
   *
   * @return whether a step was done (false: everything staged)
   */
  private boolean stageStep() {
    if (slowStep < slowSteps) {
      final double nextSlotStartSeconds = (double) (slotIndex + 1) * (double) SLOW_SLOT_S;
      if (slowStep < bodies.steps()) {
        bodies.prepareStep(nextSlotStartSeconds / SECONDS_PER_CENTURY, slowStep);
      } else {
        lunarPole.pole(nextSlotStartSeconds / SplitTime.SECONDS_PER_DAY, stagedLunarPole);
      }
      slowStep++;
      return true;
    }
    if (earth && hourStep < EarthOrientation.CELESTIAL_STEPS) {
      orientation.celestialStep(
          (double) (orientationSlotStartS + ORIENTATION_SLOT_S) / SECONDS_PER_CENTURY, hourStep);
      hourStep++;
      return true;
    }
    return false;
  }

  /**
   * Starts a new 60 s slot: third bodies, the lunar pole, and the Earth's pole once per hour. The
   * staged values are installed when they are complete and staged for exactly this slot (the slot
   * after the previous one); otherwise the slot is computed here at once and counted.
   *
   * @return whether anything was computed at once (counted in {@link #synchronousRefreshes})
   */
  private boolean refreshSlot(long whole) {
    final int before = synchronousRefreshes;
    final long s = Math.floorDiv(whole, SLOW_SLOT_S);
    final boolean slowStaged = slotStartS != Long.MIN_VALUE && s == slotIndex + 1 && slowStep == slowSteps;
    slotIndex = s;
    slotStartS = s * SLOW_SLOT_S;
    slowStep = 0;
    if (slowStaged) {
      bodies.install();
      if (!earth) {
        Vec3.copy(stagedLunarPole, pole);
      }
    } else {
      final double slotStartSeconds = (double) s * (double) SLOW_SLOT_S;
      bodies.refresh(slotStartSeconds / SECONDS_PER_CENTURY);
      if (!earth) {
        lunarPole.pole(slotStartSeconds / SplitTime.SECONDS_PER_DAY, pole);
      }
      if (slowSteps > 0) {
        synchronousRefreshes++;
      }
    }
    if (earth && !(whole >= orientationSlotStartS && whole < orientationSlotStartS + ORIENTATION_SLOT_S)) {
      final long hourStartS = Math.floorDiv(whole, ORIENTATION_SLOT_S) * ORIENTATION_SLOT_S;
      if (orientationSlotStartS != Long.MIN_VALUE && hourStartS == orientationSlotStartS + ORIENTATION_SLOT_S
          && hourStep == EarthOrientation.CELESTIAL_STEPS) {
        orientation.installCelestial();
      } else {
        orientation.updateCelestial((double) hourStartS / SECONDS_PER_CENTURY);
        synchronousRefreshes++;
      }
      orientationSlotStartS = hourStartS;
      hourStep = 0;
      orientation.poleInGcrs(pole);
    }
    return synchronousRefreshes != before;
  }

  /**
   * How many slot refreshes were computed at once instead of from staged values: the first after
   * construction or a restore, and any after a step of more than one slot (an outage, a time jump,
   * time going back) or a slot too short for its staging (cycles more than 20 s apart with
   * tides or on the Moon, more than 200 s for the Earth's hour without tides). Such a cycle costs
   * what every slot refresh cost before staging.
   *
   * @return the count since construction (not saved across a restart)
   */
  public int synchronousRefreshes() {
    return synchronousRefreshes;
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
   * One element of the Earth's GCRS-to-ITRS matrix at an instant from the installed celestial
   * matrix, without a refresh (so reading it does no staging step); the identity off the Earth.
   *
   * @param tt the instant in TT
   * @param row 0..2
   * @param column 0..2
   * @return the element
   */
  public double matrixElementAt(SplitTime tt, int row, int column) {
    if (!earth) {
      return row == column ? 1.0 : 0.0;
    }
    orientation.updateRotation(tt, ut1MinusTtS);
    return orientation.matrixElement(row, column);
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
    slotIndex = Long.MIN_VALUE;
    orientationSlotStartS = Long.MIN_VALUE;
    slowStep = 0;
    hourStep = 0;
  }
}
