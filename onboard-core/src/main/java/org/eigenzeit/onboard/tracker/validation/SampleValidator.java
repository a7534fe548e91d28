package org.eigenzeit.onboard.tracker.validation;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.math.Vec3;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitBridge;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Validation of orbit samples, in two pure stages around the frame conversion (the caller
 * converts the candidate between them): first failure wins.
 *
 * <pre>
 *   stage 1 ({@link #checkSample})   producer flag             INVALID_INPUT
 *                                    frame                     OUT_OF_RANGE (body-fixed only for the Earth)
 *                                    NaN or infinity           NOT_FINITE
 *                                    radius                    RADIUS_OUT_OF_RANGE  [r_min, r_max] of the body
 *                                    epoch after the cycle     EPOCH_JUMP   (beyond the future tolerance)
 *                                    epoch too old             STALE        (beyond the maximum age)
 *                                    epoch not after the last  EPOCH_NOT_INCREASING
 *   stage 2 ({@link #checkMotion})   speed                     SPEED_OUT_OF_RANGE  above v_max or sqrt(2.2 GM/r)
 *                                    energy with J2            ENERGY_INCONSISTENT beyond tol_rel |E_ref| + drift dt
 *   re-acquisition ({@link #checkReacquisition}, after STALE, in place of the energy check)
 *                                    two-body periapsis        SPEED_OUT_OF_RANGE  below r_min (no orbit: a zero or
 *                                                                                  subnormal velocity fails here)
 *                                    no sample held            REACQUIRING         this one is held
 *                                    the held sample, propagated (RK4, J2) to this epoch, within
 *                                    {@value #CONFIRM_POSITION_M} m and {@value #CONFIRM_VELOCITY_MPS} m/s,
 *                                    0 to {@value #CONFIRM_SPAN_S} s earlier      OK (re-acquired)
 *                                    otherwise                 UNCONFIRMED         this one is held instead
 * </pre>
 *
 * So after STALE a sample is taken only when the one before it agrees with it: a single wrong
 * sample (a 50 km jump, a zero velocity) is never taken, and two consistent samples after a
 * manoeuvre are. The very first sample of a tracker is taken as given (there is nothing to check
 * it against; a ground clock at rest, which has no orbit, is a valid first sample).
 *
 * Both stages are pure: they read the sample and the reference (the state of the last node: its
 * epoch, orbital energy and the last accepted sample's epoch) and write only their outputs (the
 * caller's arrays, and the candidate's radius and energy kept here for {@link #accepted}). The
 * reference changes only through {@link #accepted} and {@link #referenceAt}, which the tracker
 * calls after it has taken a node.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class SampleValidator {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 2 * 16 + 8 + 4 + 16 + 6 * 8;
  /** Largest position disagreement of a confirming sample, m (GNSS noise, J2-only propagation). */
  public static final double CONFIRM_POSITION_M = 1000.0;
  /** Largest velocity disagreement of a confirming sample, m/s. */
  public static final double CONFIRM_VELOCITY_MPS = 1.0;
  /** Longest span from the held sample to a confirming one, s. */
  public static final double CONFIRM_SPAN_S = 600.0;

  private final boolean earth;
  private final double gm;
  private final double j2Factor;
  private final double minRadius;
  private final double maxRadius;
  private final double maxSpeed2;
  private final double futureToleranceS;
  private final double maxSampleAgeS;
  private final double energyToleranceRel;
  private final double energyDriftM2PerS3;
  private final double energyLimit;

  private double candRadius;
  private double candInvRadius;
  private double candEnergy;

  private final SplitTime lastSampleTt = new SplitTime();
  private final SplitTime referenceTt = new SplitTime();
  private double referenceEnergy;
  private final OrbitBridge propagator;
  private final double bridgeStepS;
  private final SplitTime heldTt = new SplitTime();
  private final double[] heldR = new double[3];
  private final double[] heldV = new double[3];
  private final double[] predictedR = new double[3];
  private final double[] predictedV = new double[3];
  private boolean haveHeld;

  /**
   * Creates a validator for a configuration.
   *
   * @param config the model configuration (body limits, tolerances)
   */
  public SampleValidator(ModelConfig config) {
    final CentralBody body = config.body();
    this.earth = body.centre() == CentralBody.CENTRE_EARTH;
    this.gm = body.gmM3PerS2();
    this.j2Factor = body.j2() * body.referenceRadiusM() * body.referenceRadiusM();
    this.minRadius = body.minRadiusM();
    this.maxRadius = body.maxRadiusM();
    this.maxSpeed2 = body.maxSpeedMPerS() * body.maxSpeedMPerS();
    this.futureToleranceS = config.futureToleranceS();
    this.maxSampleAgeS = config.maxSampleAgeS();
    this.energyToleranceRel = config.energyToleranceRel();
    this.energyDriftM2PerS3 = config.energyDriftM2PerS3();
    this.energyLimit = maxSpeed2 + 2.0 * gm / minRadius;
    this.propagator = new OrbitBridge(gm, body.referenceRadiusM(), body.j2());
    this.bridgeStepS = config.bridgeStepS();
  }

  /**
   * Stage 1: producer flag, frame, finiteness, radius and epoch. Copies the sample's epoch and
   * state (as given) into the caller's holders.
   *
   * @param s the sample
   * @param nowTt the cycle time in TT
   * @param initialized whether a first sample has been taken (epoch order is checked only then)
   * @param epochOut receives the sample's epoch
   * @param givenR receives the position as given, m
   * @param givenV receives the velocity as given, m/s
   * @return {@link Status#OK} or the first fault (see the class table)
   */
  @CheckReturnValue
  public int checkSample(OrbitSample s, SplitTime nowTt, boolean initialized, SplitTime epochOut, double[] givenR,
      double[] givenV) {
    if (!s.valid()) {
      return Status.INVALID_INPUT;
    }
    final int frame = s.frame();
    if (frame != OrbitSample.FRAME_INERTIAL && !(earth && frame == OrbitSample.FRAME_BODY_FIXED)) {
      return Status.OUT_OF_RANGE;
    }
    s.copyState(givenR, givenV);
    if (!Vec3.isFinite(givenR) || !Vec3.isFinite(givenV)) {
      return Status.NOT_FINITE;
    }
    final double r = Vec3.norm(givenR);
    if (!(r >= minRadius && r <= maxRadius)) {
      return Status.RADIUS_OUT_OF_RANGE;
    }
    candRadius = r;
    s.epochTt(epochOut);
    return checkEpoch(epochOut, nowTt, initialized);
  }

  /** The sample's epoch against the cycle time and the last accepted sample. */
  private int checkEpoch(SplitTime epoch, SplitTime nowTt, boolean initialized) {
    final double ageS = nowTt.secondsSince(epoch);
    if (ageS < -futureToleranceS) {
      return Status.EPOCH_JUMP;
    }
    if (ageS > maxSampleAgeS) {
      return Status.STALE;
    }
    if (initialized && epoch.compareTo(lastSampleTt) <= 0) {
      return Status.EPOCH_NOT_INCREASING;
    }
    return Status.OK;
  }

  /**
   * Stage 2, on the inertial candidate: speed limit and escape speed, then the energy (with J2
   * about the pole) against the reference.
   *
   * @param epoch the sample's epoch
   * @param candR the inertial position, m
   * @param candV the inertial velocity, m/s
   * @param pole the body's pole in the inertial frame at the epoch
   * @param checkEnergy whether to check the energy (not before the first node, not after STALE)
   * @return {@link Status#OK}, {@link Status#SPEED_OUT_OF_RANGE} or {@link
   *     Status#ENERGY_INCONSISTENT}
   */
  @CheckReturnValue
  public int checkMotion(SplitTime epoch, double[] candR, double[] candV, double[] pole, boolean checkEnergy) {
    final double r = candRadius;
    final double v2 = Vec3.dot(candV, candV);
    if (!(v2 <= maxSpeed2) || v2 * r > 2.2 * gm) {
      return Status.SPEED_OUT_OF_RANGE;
    }
    candInvRadius = 1.0 / r;
    candEnergy = energy(candR, candV, candInvRadius, pole);
    if (checkEnergy) {
      final double dt = Math.abs(epoch.secondsSince(referenceTt));
      final double tol = energyToleranceRel * Math.abs(referenceEnergy) + energyDriftM2PerS3 * dt;
      if (!(Math.abs(candEnergy - referenceEnergy) <= tol)) {
        return Status.ENERGY_INCONSISTENT;
      }
    }
    return Status.OK;
  }

  /**
   * Re-acquisition after STALE (in place of the energy check, after stage 2 passed): the sample
   * must describe an orbit (two-body periapsis at least r_min) and agree with the held sample
   * propagated to its epoch. Pure: holding a sample is {@link #hold}'s job.
   *
   * @param epoch the sample's epoch
   * @param candR the inertial position, m
   * @param candV the inertial velocity, m/s
   * @param pole the body's pole in the inertial frame
   * @return {@link Status#OK} (confirmed), {@link Status#REACQUIRING} (nothing held yet), {@link
   *     Status#UNCONFIRMED} (disagrees with the held one) or {@link Status#SPEED_OUT_OF_RANGE} (no
   *     orbit)
   */
  @CheckReturnValue
  public int checkReacquisition(SplitTime epoch, double[] candR, double[] candV, double[] pole) {
    if (!(periapsisRadius(candR, candV) >= minRadius)) {
      return Status.SPEED_OUT_OF_RANGE;
    }
    if (!haveHeld) {
      return Status.REACQUIRING;
    }
    final double span = epoch.secondsSince(heldTt);
    if (!(span > 0 && span <= CONFIRM_SPAN_S)) {
      return Status.UNCONFIRMED;
    }
    Vec3.copy(heldR, predictedR);
    Vec3.copy(heldV, predictedV);
    propagator.setPole(pole);
    if (propagator.propagate(predictedR, predictedV, span, bridgeStepS) < 0) {
      return Status.UNCONFIRMED;
    }
    return distance(predictedR, candR) <= CONFIRM_POSITION_M && distance(predictedV, candV) <= CONFIRM_VELOCITY_MPS
        ? Status.OK : Status.UNCONFIRMED;
  }

  private static double distance(double[] a, double[] b) {
    final double dx = a[0] - b[0];
    final double dy = a[1] - b[1];
    final double dz = a[2] - b[2];
    return Math.sqrt(dx * dx + dy * dy + dz * dz);
  }

  /**
   * Periapsis radius of the two-body (monopole) orbit through a state: p / (1 + e) with the
   * semi-latus rectum p = h^2/GM and e = sqrt(1 + 2 E h^2 / GM^2) (e.g. Vallado 2013, ch. 2).
   *
   * @param r position, m
   * @param v velocity, m/s
   * @return the periapsis radius, m (0 for a state with no angular momentum)
   */
  public double periapsisRadius(double[] r, double[] v) {
    final double hx = r[1] * v[2] - r[2] * v[1];
    final double hy = r[2] * v[0] - r[0] * v[2];
    final double hz = r[0] * v[1] - r[1] * v[0];
    final double h2 = hx * hx + hy * hy + hz * hz;
    final double e = 0.5 * Vec3.dot(v, v) - gm / Vec3.norm(r);
    final double ecc = Math.sqrt(Math.max(0.0, 1.0 + 2.0 * e * h2 / (gm * gm)));
    return h2 / gm / (1.0 + ecc);
  }

  /**
   * Holds a plausible sample for the next one to confirm (re-acquisition).
   *
   * @param epoch its epoch
   * @param candR its inertial position, m
   * @param candV its inertial velocity, m/s
   */
  public void hold(SplitTime epoch, double[] candR, double[] candV) {
    heldTt.setTo(epoch);
    Vec3.copy(candR, heldR);
    Vec3.copy(candV, heldV);
    haveHeld = true;
  }

  /**
   * Orbital energy per unit mass with J2 about a pole, m^2/s^2.
   *
   * @param r inertial position, m
   * @param v inertial velocity, m/s
   * @param invR 1/|r| (rotations keep it), 1/m
   * @param pole unit vector of the pole
   * @return v^2/2 - GM/r - U_J2
   */
  public double energy(double[] r, double[] v, double invR, double[] pole) {
    final double sinLat = Vec3.dot(r, pole) * invR;
    final double u0 = gm * invR;
    final double uJ2 = -u0 * j2Factor * invR * invR * (1.5 * sinLat * sinLat - 0.5);
    return 0.5 * Vec3.dot(v, v) - u0 - uJ2;
  }

  /**
   * The candidate's epoch became a node: it is now the reference (epoch order and energy).
   *
   * @param epoch the sample's epoch
   */
  public void accepted(SplitTime epoch) {
    haveHeld = false;
    lastSampleTt.setTo(epoch);
    referenceTt.setTo(epoch);
    referenceEnergy = candEnergy;
  }

  /**
   * A bridged node became the energy reference.
   *
   * @param tt the node's time
   * @param energyM2PerS2 its orbital energy (see {@link #energy})
   */
  public void referenceAt(SplitTime tt, double energyM2PerS2) {
    referenceTt.setTo(tt);
    referenceEnergy = energyM2PerS2;
  }

  /**
   * 1/|r| of the candidate (valid after {@link #checkMotion}), 1/m.
   *
   * @return the inverse radius
   */
  public double inverseRadius() {
    return candInvRadius;
  }

  /**
   * Writes the reference.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    lastSampleTt.save(w);
    referenceTt.save(w);
    w.putDouble(referenceEnergy);
    w.putBoolean(haveHeld);
    heldTt.save(w);
    for (int i = 0; i < 3; i++) {
      w.putDouble(heldR[i]);
      w.putDouble(heldV[i]);
    }
  }

  /**
   * Restores the reference (two instants, an energy within +-(v_max^2 + 2 GM/r_min)) and the held
   * sample (position within 2 r_max, velocity within 2 v_max).
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    lastSampleTt.restore(r);
    referenceTt.restore(r);
    referenceEnergy = r.getDoubleIn(-energyLimit, energyLimit);
    haveHeld = r.getFlag();
    heldTt.restore(r);
    for (int i = 0; i < 3; i++) {
      heldR[i] = r.getDoubleIn(-2.0 * maxRadius, 2.0 * maxRadius);
      heldV[i] = r.getDoubleIn(-2.0 * Math.sqrt(maxSpeed2), 2.0 * Math.sqrt(maxSpeed2));
    }
  }
}
