package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.frames.LunarPole;
import org.eigenzeit.onboard.math.CompensatedSum;
import org.eigenzeit.onboard.math.Vec3;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Accumulates the proper-time offset of the onboard clock against the body's TT-like scale,
 * {@code Delta tau(t) = integral of y dT}, from orbit samples as they arrive, with varying steps,
 * gaps and bad data. The caller drives it: one {@link #step} per flight-software cycle.
 *
 * <p>Scheme (exact identity plus quadrature of a smooth remainder): along any trajectory
 * {@code y = g - (2/c^2) d(r.v)/dt} with {@code g = y + 2 (v^2 + r.a)/c^2}, so
 *
 * <pre>
 *   Delta tau(t) = -2 (r.v(t) - r.v(t0))/c^2  +  integral_{t0}^{t} g dt       (periodic + secular)
 * </pre>
 *
 * The first term carries the whole eccentricity term (IS-GPS-200 F e sqrt(A) sin E) exactly; the
 * integrand g is the secular rate plus the slow J2 (-4 U_J2/c^2) and tidal variations, and is
 * integrated by the trapezoidal rule with Neumaier-compensated summation. Error bound per step h:
 * {@code h^3 max|g''| / 12} (about 7e-18 s^-2 for g'' in LEO, so 6e-19 s per 1 s step) plus
 * {@code (2/c^2) integral r . delta_a dt} for forces the model omits (radiation pressure, drag,
 * harmonics above the set degree): a bounded periodic error of about 0.4 ps at GPS altitude for
 * 1e-7 m/s^2 of radiation pressure. See docs/algorithms.md.
 *
 * <p>Validation of every sample (first failure wins, counted per code): producer flag
 * (INVALID_INPUT), frame (OUT_OF_RANGE), NaN or infinity (NOT_FINITE), radius and speed limits of
 * the body and escape speed (RADIUS_OUT_OF_RANGE, SPEED_OUT_OF_RANGE), epoch not after the last
 * accepted (EPOCH_NOT_INCREASING), epoch after the cycle time (EPOCH_JUMP), sample too old
 * (STALE), and orbital energy (with J2) against the last state beyond tolerance
 * (ENERGY_INCONSISTENT; skipped when re-acquiring after STALE). A rejected sample leaves the state
 * untouched; the tracker then bridges the last good state with {@link OrbitBridge} to the cycle
 * time (solution status DEGRADED_BRIDGED, with a growing error bound) until the bridging limit,
 * after which it refuses (STALE) and holds the last offset and rate.
 *
 * <p>Not thread-safe: one owner calls every method. No allocation after construction; all loops
 * bounded; no exceptions after construction.
 */
public final class ProperTimeTracker {
  private static final double MINUS_TWO_OVER_C2 = -2.0 / CentralBody.C2;

  private final ModelConfig config;
  private final RateModel model;
  private final EarthOrientation orientation;
  private final LunarPole lunarPole;
  private final OrbitBridge bridge;
  private final double gm;
  private final double j2Factor;
  private final boolean earth;
  private final boolean needsBodyFixed;
  private final double minRadius;
  private final double maxRadius;
  private final double maxSpeed2;

  private final RateComponents rate = new RateComponents();
  private final CompensatedSum secular = new CompensatedSum();
  private final SplitTime nodeTt = new SplitTime();
  private final SplitTime lastSampleTt = new SplitTime();
  private final SplitTime lastGoodSampleTt = new SplitTime();
  private final double[] rInertial = new double[3];
  private final double[] vInertial = new double[3];
  private final double[] rBodyFixed = new double[3];
  private final double[] pole = new double[3];
  private final double[] candR = new double[3];
  private final double[] candV = new double[3];
  private final double[] candRb = new double[3];
  private final double[] rawR = new double[3];
  private final double[] rawV = new double[3];
  private final int[] counters = new int[Status.COUNT];

  private boolean initialized;
  private static final long SLOT_S = (long) RateModel.SLOW_SLOT_S;
  private static final double SECONDS_PER_CENTURY = 36_525.0 * SplitTime.SECONDS_PER_DAY;

  /**
   * Cadence of the Earth's precession-nutation (the celestial matrix and the pole in the GCRS), s:
   * the matrix of the slot's start is used for the whole slot. The CIP moves by less than 6e-8
   * rad in an hour (precession and the largest nutation rates; checked against IAU SOFA in
   * {@code EarthOrientationTest}), below the 1.4e-7 rad of the truncated nutation series and
   * giving below 1e-20 in y through the J2 term. Slots are aligned to whole hours of TT since
   * J2000.0.
   */
  public static final long ORIENTATION_SLOT_S = 3600L;

  private long slotStartS = Long.MIN_VALUE;
  private long orientationSlotStartS = Long.MIN_VALUE;
  private double previousIntegrand;
  private double olderIntegrand;
  private double rDotV0;
  private double initialOffsetS;
  private double lastEnergy;
  private double candEnergy;
  private double candInvRadius;
  private double candRadius;
  private double lastStepS;
  private double bridgedForS;
  private int solutionStatus = Status.NOT_READY;
  private int lastSampleStatus = Status.NOT_READY;

  /**
   * Creates a tracker (allocates all its working storage now).
   *
   * @param config the configuration
   */
  public ProperTimeTracker(ModelConfig config) {
    this.config = config;
    this.model = new RateModel(config);
    final CentralBody body = config.body;
    this.earth = body.centre() == CentralBody.CENTRE_EARTH;
    this.needsBodyFixed = earth && config.level == ModelLevel.HARMONICS;
    this.orientation = new EarthOrientation(config.math, body.rotationRateRadPerS());
    this.lunarPole = new LunarPole(config.math);
    this.bridge = new OrbitBridge(body.gmM3PerS2(), body.referenceRadiusM(), body.j2());
    this.gm = body.gmM3PerS2();
    this.j2Factor = body.j2() * body.referenceRadiusM() * body.referenceRadiusM();
    this.minRadius = body.minRadiusM();
    this.maxRadius = body.maxRadiusM();
    this.maxSpeed2 = body.maxSpeedMPerS() * body.maxSpeedMPerS();
    pole[2] = 1.0;
  }

  /**
   * One cycle: validates and takes the sample if there is one, otherwise (or if it is rejected)
   * bridges the last good state to {@code nowTt}.
   *
   * @param nowTt the cycle time in TT
   * @param sample the newest orbit estimate, or null when none arrived this cycle
   * @return the sample's verdict: {@link Status#OK} or {@link Status#LONG_STEP} when taken; a
   *     fault code when rejected; with no sample, the solution status ({@link Status#OK}, {@link
   *     Status#DEGRADED_BRIDGED}, {@link Status#STALE} or {@link Status#NOT_READY})
   */
  public int step(SplitTime nowTt, OrbitSample sample) {
    if (sample != null) {
      final int verdict = validate(sample, nowTt);
      counters[verdict]++;
      lastSampleStatus = verdict;
      if (verdict == Status.OK) {
        return accept(sample);
      }
      if (initialized) {
        bridgeTo(nowTt);
      }
      return verdict;
    }
    if (initialized) {
      bridgeTo(nowTt);
    }
    return solutionStatus;
  }

  // validate and its parts are kept small so that a JIT inlines the whole cycle into its caller.
  private int validate(OrbitSample s, SplitTime nowTt) {
    if (!s.valid()) {
      return Status.INVALID_INPUT;
    }
    final int frame = s.frame();
    if (frame != OrbitSample.FRAME_INERTIAL && !(earth && frame == OrbitSample.FRAME_BODY_FIXED)) {
      return Status.OUT_OF_RANGE;
    }
    final int state = checkState(s);
    if (state != Status.OK) {
      return state;
    }
    final int epoch = checkEpoch(s.epoch(), nowTt);
    if (epoch != Status.OK) {
      return epoch;
    }
    toInertial(s.epoch(), frame);
    return checkMotion(s.epoch());
  }

  /**
   * Copies the sample's state (inertial input below level HARMONICS needs no frame work and goes
   * straight into the candidate) and checks finiteness and radius; leaves |r| in candRadius.
   */
  private int checkState(OrbitSample s) {
    final boolean direct = isDirect(s.frame());
    final double[] inR = direct ? candR : rawR;
    final double[] inV = direct ? candV : rawV;
    s.copyState(inR, inV);
    if (!Vec3.isFinite(inR) || !Vec3.isFinite(inV)) {
      return Status.NOT_FINITE;
    }
    final double r = Vec3.norm(inR);
    if (!(r >= minRadius && r <= maxRadius)) {
      return Status.RADIUS_OUT_OF_RANGE;
    }
    candRadius = r;
    return Status.OK;
  }

  /** The sample's epoch against the cycle time and the last accepted sample. */
  private int checkEpoch(SplitTime epoch, SplitTime nowTt) {
    final double ageS = nowTt.secondsSince(epoch);
    if (ageS < -config.futureToleranceS) {
      return Status.EPOCH_JUMP;
    }
    if (ageS > config.maxSampleAgeS) {
      return Status.STALE;
    }
    if (initialized && epoch.compareTo(lastSampleTt) <= 0) {
      return Status.EPOCH_NOT_INCREASING;
    }
    return Status.OK;
  }

  /** Speed limits and escape speed, then the energy against the last state (inertial candidate). */
  private int checkMotion(SplitTime epoch) {
    final double r = candRadius;
    final double v2 = Vec3.dot(candV, candV);
    if (!(v2 <= maxSpeed2) || v2 * r > 2.2 * gm) {
      return Status.SPEED_OUT_OF_RANGE;
    }
    candInvRadius = 1.0 / r;
    candEnergy = energy(candR, candV, candInvRadius);
    if (initialized && solutionStatus != Status.STALE) {
      final double dt = Math.abs(epoch.secondsSince(nodeTt));
      final double tol = config.energyToleranceRel * Math.abs(lastEnergy) + config.energyDriftM2PerS3 * dt;
      if (!(Math.abs(candEnergy - lastEnergy) <= tol)) {
        return Status.ENERGY_INCONSISTENT;
      }
    }
    return Status.OK;
  }

  /** Whether a sample in this frame goes straight into the candidate (Earth, inertial, below HARMONICS). */
  private boolean isDirect(int frame) {
    return earth && frame == OrbitSample.FRAME_INERTIAL && !needsBodyFixed;
  }

  /**
   * Fills candR, candV (inertial) and candRb (body-fixed) from rawR, rawV at the epoch; a direct
   * sample (see {@link #isDirect}) is already in candR, candV and needs only the pole.
   */
  private void toInertial(SplitTime epochTt, int frame) {
    refreshSlow(epochTt);
    if (isDirect(frame)) {
      return;
    }
    if (earth) {
      orientation.updateRotation(epochTt, config.ut1MinusTtS);
      if (frame == OrbitSample.FRAME_BODY_FIXED) {
        Vec3.copy(rawR, candRb);
        orientation.positionToGcrs(rawR, candR);
        orientation.velocityToGcrs(rawR, rawV, candV);
      } else {
        Vec3.copy(rawR, candR);
        Vec3.copy(rawV, candV);
        orientation.positionToItrs(rawR, candRb);
      }
    } else {
      Vec3.copy(rawR, candR);
      Vec3.copy(rawV, candV);
      Vec3.copy(rawR, candRb);
    }
  }

  private void refreshSlow(SplitTime tt) {
    final long whole = tt.wholeSeconds();
    if (whole >= slotStartS && whole < slotStartS + SLOT_S) {
      return; // same 60 s slot: no division on the common path
    }
    refreshSlot(whole);
  }

  /** Starts a new 60 s slot: third bodies, the lunar pole, and the Earth's pole once per hour. */
  private void refreshSlot(long whole) {
    final long s = Math.floorDiv(whole, SLOT_S);
    slotStartS = s * SLOT_S;
    final double slotStartSeconds = (double) s * RateModel.SLOW_SLOT_S;
    model.refreshThirdBodies(slotStartSeconds / SECONDS_PER_CENTURY);
    if (!earth) {
      lunarPole.pole(slotStartSeconds / SplitTime.SECONDS_PER_DAY, pole);
    } else if (!(whole >= orientationSlotStartS && whole < orientationSlotStartS + ORIENTATION_SLOT_S)) {
      final long h = Math.floorDiv(whole, ORIENTATION_SLOT_S);
      orientationSlotStartS = h * ORIENTATION_SLOT_S;
      orientation.updateCelestial((double) orientationSlotStartS / SECONDS_PER_CENTURY);
      orientation.poleInGcrs(pole);
    }
  }

  /** Orbital energy with J2 about the current pole; invR is 1/|r| (rotations keep it). */
  private double energy(double[] r, double[] v, double invR) {
    final double sinLat = Vec3.dot(r, pole) * invR;
    final double u0 = gm * invR;
    final double uJ2 = -u0 * j2Factor * invR * invR * (1.5 * sinLat * sinLat - 0.5);
    return 0.5 * Vec3.dot(v, v) - u0 - uJ2;
  }

  private int accept(OrbitSample s) {
    model.evaluateWithInverseRadius(candR, candV, candRb, pole, candInvRadius, rate);
    Vec3.copy(candR, rInertial);
    Vec3.copy(candV, vInertial);
    Vec3.copy(candRb, rBodyFixed);
    lastEnergy = candEnergy;
    lastSampleTt.setTo(s.epoch());
    lastGoodSampleTt.setTo(s.epoch());
    bridgedForS = 0.0;
    int result = Status.OK;
    if (!initialized) {
      initialized = true;
      rDotV0 = rate.rDotVM2PerS;
      secular.reset();
      lastStepS = 0.0;
    } else {
      final double h = s.epoch().secondsSince(nodeTt);
      integrate(h);
      if (h > 1.5 * config.nominalStepS) {
        result = Status.LONG_STEP;
      }
    }
    previousIntegrand = rate.integrandRate;
    nodeTt.setTo(s.epoch());
    solutionStatus = Status.OK;
    return result;
  }

  /**
   * Adds the integral of g over the last interval [t1, t2] of length h: the trapezoid, plus the
   * curvature correction of the quadratic through the two previous nodes when the steps are
   * comparable: -f[t0,t1,t2] h^3/6 (Newton divided differences), which makes the rule third
   * order (for equal steps it is h/12 (-g0 + 8 g1 + 5 g2)).
   */
  private void integrate(double h) {
    final double g2 = rate.integrandRate;
    final double g1 = previousIntegrand;
    double increment = 0.5 * h * (g1 + g2);
    final double h1 = lastStepS;
    if (h1 == h) {
      // equal steps: h/12 (-g0 + 8 g1 + 5 g2), the same rule without divisions
      increment = h * (5.0 * g2 + 8.0 * g1 - olderIntegrand) * (1.0 / 12.0);
    } else if (h1 > 0 && h <= 4.0 * h1 && h1 <= 4.0 * h) {
      final double f12 = (g2 - g1) / h;
      final double f01 = (g1 - olderIntegrand) / h1;
      final double f012 = (f12 - f01) / (h1 + h);
      increment -= f012 * h * h * h / 6.0;
    }
    secular.add(increment);
    olderIntegrand = g1;
    lastStepS = h;
  }

  private void bridgeTo(SplitTime nowTt) {
    final double span = nowTt.secondsSince(nodeTt);
    if (!(span > 0)) {
      return;
    }
    final double age = nowTt.secondsSince(lastGoodSampleTt);
    if (age > config.bridgeLimitS) {
      solutionStatus = Status.STALE;
      bridgedForS = age;
      return;
    }
    bridge.setPole(pole);
    if (bridge.propagate(rInertial, vInertial, span, config.bridgeStepS) < 0) {
      solutionStatus = Status.STALE;
      bridgedForS = age;
      return;
    }
    refreshSlow(nowTt); // also refreshes the pole
    if (earth) {
      if (needsBodyFixed) {
        orientation.updateRotation(nowTt, config.ut1MinusTtS);
        orientation.positionToItrs(rInertial, rBodyFixed);
      }
    } else {
      Vec3.copy(rInertial, rBodyFixed);
    }
    final double invR = 1.0 / Vec3.norm(rInertial);
    model.evaluateWithInverseRadius(rInertial, vInertial, rBodyFixed, pole, invR, rate);
    integrate(span);
    previousIntegrand = rate.integrandRate;
    lastEnergy = energy(rInertial, vInertial, invR);
    nodeTt.setTo(nowTt);
    bridgedForS = age;
    solutionStatus = Status.DEGRADED_BRIDGED;
  }

  /**
   * Sets the offset at the first accepted sample (for example the clock's initial offset).
   *
   * @param offsetS offset in seconds added to every reported offset
   * @return {@link Status#OK} or {@link Status#NOT_FINITE}
   */
  public int setInitialOffsetS(double offsetS) {
    if (!Double.isFinite(offsetS)) {
      return Status.NOT_FINITE;
    }
    initialOffsetS = offsetS;
    return Status.OK;
  }

  /**
   * Returns delta tau at the last node (sample epoch or bridged cycle time), s.
   *
   * @return Delta tau at the last node (sample epoch or bridged cycle time), s
   */
  public double offsetS() {
    return initialOffsetS + secular.value() + periodicOffsetS();
  }

  /**
   * Delta tau extrapolated from the last node with the current rate.
   *
   * @param tt instant in TT
   * @return the offset at {@code tt}, s
   */
  public double offsetAtS(SplitTime tt) {
    return offsetS() + rate.total * tt.secondsSince(nodeTt);
  }

  /**
   * Delta tau extrapolated to an instant given as a base time plus a shift in seconds (lets a
   * caller form a time and its correction without an intermediate normalisation).
   *
   * @param base instant in TT
   * @param plusS seconds added to the base
   * @return the offset, s
   */
  public double offsetAtS(SplitTime base, double plusS) {
    return offsetS() + rate.total * (base.secondsSince(nodeTt) + plusS);
  }

  /**
   * Returns the secular part: the integral of g since the first sample, s.
   *
   * @return the secular part: the integral of g since the first sample, s
   */
  public double secularOffsetS() {
    return secular.value();
  }

  /**
   * Returns the periodic part -2 (r.v - r.v0)/c^2, s.
   *
   * @return the periodic part -2 (r.v - r.v0)/c^2, s
   */
  public double periodicOffsetS() {
    return initialized ? MINUS_TWO_OVER_C2 * (rate.rDotVM2PerS - rDotV0) : 0.0;
  }

  /**
   * Returns y at the last node.
   *
   * @return y at the last node
   */
  public double fractionalFrequency() {
    return rate.total;
  }

  /**
   * Copies the components of the last evaluation.
   *
   * @param out receives the components
   */
  public void rate(RateComponents out) {
    out.setTo(rate);
  }

  /**
   * Returns bound on the extra fractional-frequency error while bridging (0 on fresh samples).
   *
   * @return bound on the extra fractional-frequency error while bridging (0 on fresh samples)
   */
  public double rateErrorBound() {
    return solutionStatus == Status.OK ? 0.0 : config.bridgeRateErrorPerS * bridgedForS;
  }

  /**
   * Returns seconds since the last good sample at the last cycle (0 on fresh samples).
   *
   * @return seconds since the last good sample at the last cycle (0 on fresh samples)
   */
  public double bridgedForS() {
    return bridgedForS;
  }

  /**
   * Returns oK, DEGRADED_BRIDGED, STALE or NOT_READY.
   *
   * @return OK, DEGRADED_BRIDGED, STALE or NOT_READY
   */
  public int solutionStatus() {
    return solutionStatus;
  }

  /**
   * Returns the verdict on the last sample offered.
   *
   * @return the verdict on the last sample offered
   */
  public int lastSampleStatus() {
    return lastSampleStatus;
  }

  /**
   * Returns the length of the last integration step, s.
   *
   * @return the length of the last integration step, s
   */
  public double lastStepS() {
    return lastStepS;
  }

  /**
   * How many samples received a given verdict.
   *
   * @param code a status code
   * @return the count (0 for codes out of range)
   */
  public int count(int code) {
    return code >= 0 && code < Status.COUNT ? counters[code] : 0;
  }

  /**
   * The time of the last node.
   *
   * @param out receives the instant (TT)
   */
  public void nodeTime(SplitTime out) {
    out.setTo(nodeTt);
  }

  /**
   * One component of the current inertial position, m.
   *
   * @param axis 0..2
   * @return the component
   */
  public double inertialPositionM(int axis) {
    return rInertial[axis];
  }

  /**
   * One component of the current inertial velocity, m/s.
   *
   * @param axis 0..2
   * @return the component
   */
  public double inertialVelocityMPerS(int axis) {
    return vInertial[axis];
  }

  /**
   * Returns whether a first sample has been accepted.
   *
   * @return whether a first sample has been accepted
   */
  public boolean isInitialized() {
    return initialized;
  }

  /** Number of bytes {@link #save} writes. */
  public static final int STATE_BYTES = 4 * 4 + 12 * 8 + 3 * 16 + 12 * 8 + 8 * 8 + Status.COUNT * 4;

  /**
   * Writes the complete integration state (not the configuration) for a warm restart.
   *
   * @param w the writer, positioned where the state goes
   */
  public void save(StateWriter w) {
    w.putBoolean(initialized);
    w.putInt(solutionStatus);
    w.putInt(lastSampleStatus);
    w.putInt(0); // reserved
    w.putDouble(previousIntegrand);
    w.putDouble(olderIntegrand);
    w.putDouble(rDotV0);
    w.putDouble(initialOffsetS);
    w.putDouble(lastEnergy);
    w.putDouble(lastStepS);
    w.putDouble(bridgedForS);
    w.putDouble(secular.high());
    w.putDouble(secular.low());
    w.putDouble(0.0); // reserved
    w.putDouble(0.0);
    w.putDouble(0.0);
    putTime(w, nodeTt);
    putTime(w, lastSampleTt);
    putTime(w, lastGoodSampleTt);
    for (int i = 0; i < 3; i++) {
      w.putDouble(rInertial[i]);
      w.putDouble(vInertial[i]);
      w.putDouble(rBodyFixed[i]);
      w.putDouble(pole[i]);
    }
    w.putDouble(rate.kinematic);
    w.putDouble(rate.gravitational);
    w.putDouble(rate.harmonics);
    w.putDouble(rate.tidal);
    w.putDouble(rate.higherOrder);
    w.putDouble(rate.total);
    w.putDouble(rate.rDotVM2PerS);
    w.putDouble(rate.integrandRate);
    for (int i = 0; i < Status.COUNT; i++) {
      w.putInt(counters[i]);
    }
  }

  /**
   * Restores the state written by {@link #save}. The caller checks the buffer's integrity (CRC,
   * length, version) first; this method only reads.
   *
   * @param r the reader, positioned at the state
   * @return {@link Status#OK}, or the reader's {@link Status#BUFFER_TOO_SMALL}
   */
  public int restore(StateReader r) {
    initialized = r.getBoolean();
    solutionStatus = r.getInt();
    lastSampleStatus = r.getInt();
    r.getInt();
    previousIntegrand = r.getDouble();
    olderIntegrand = r.getDouble();
    rDotV0 = r.getDouble();
    initialOffsetS = r.getDouble();
    lastEnergy = r.getDouble();
    lastStepS = r.getDouble();
    bridgedForS = r.getDouble();
    final double hi = r.getDouble();
    final double lo = r.getDouble();
    secular.set(hi, lo);
    r.getDouble();
    r.getDouble();
    r.getDouble();
    getTime(r, nodeTt);
    getTime(r, lastSampleTt);
    getTime(r, lastGoodSampleTt);
    for (int i = 0; i < 3; i++) {
      rInertial[i] = r.getDouble();
      vInertial[i] = r.getDouble();
      rBodyFixed[i] = r.getDouble();
      pole[i] = r.getDouble();
    }
    rate.kinematic = r.getDouble();
    rate.gravitational = r.getDouble();
    rate.harmonics = r.getDouble();
    rate.tidal = r.getDouble();
    rate.higherOrder = r.getDouble();
    rate.total = r.getDouble();
    rate.rDotVM2PerS = r.getDouble();
    rate.integrandRate = r.getDouble();
    for (int i = 0; i < Status.COUNT; i++) {
      counters[i] = r.getInt();
    }
    slotStartS = Long.MIN_VALUE;
    orientationSlotStartS = Long.MIN_VALUE;
    return r.status();
  }

  private static void putTime(StateWriter w, SplitTime t) {
    w.putLong(t.wholeSeconds());
    w.putDouble(t.fractionS());
  }

  private static void getTime(StateReader r, SplitTime t) {
    final long whole = r.getLong();
    final double fraction = r.getDouble();
    if (t.set(whole, fraction) != Status.OK) {
      t.set(whole, 0.0);
    }
  }
}
