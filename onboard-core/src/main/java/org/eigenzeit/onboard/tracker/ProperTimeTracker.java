package org.eigenzeit.onboard.tracker;

import org.eigenzeit.onboard.gravity.GravityTable;
import org.eigenzeit.onboard.math.Vec3;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.relativity.RateComponents;
import org.eigenzeit.onboard.relativity.RateModel;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.bridging.OutageBridge;
import org.eigenzeit.onboard.tracker.cadence.OrientationCache;
import org.eigenzeit.onboard.tracker.integration.OffsetIntegrator;
import org.eigenzeit.onboard.tracker.validation.SampleValidator;

/**
 * The relativistic model of the clock: accumulates the proper-time offset of the onboard clock
 * against the body's TT-like scale, {@code Delta tau(t) = integral of y dT}, from orbit samples as
 * they arrive, with varying steps, gaps and bad data. The caller drives it: one {@link #step} per
 * flight-software cycle. It composes four components, in the order data flows through them:
 *
 * <pre>
 *   sample -> {@link SampleValidator} stage 1 (flag, frame, finite, radius, epoch)
 *          -> {@link OrientationCache} (slot refresh, frame conversion at the sample's epoch)
 *          -> {@link SampleValidator} stage 2 (speed, energy; after STALE, the re-acquisition
 *             gate instead of the energy: a sample is taken when the one held before confirms it)
 *          -> {@link RateModel} at the new node -> {@link OffsetIntegrator} (node added)
 *   no sample, or a rejected one -> {@link OutageBridge} (propagate to the cycle time, or STALE)
 *          -> {@link OrientationCache} -> {@link RateModel} -> {@link OffsetIntegrator}
 * </pre>
 *
 * A rejected sample leaves every component's state as it was; the tracker then bridges. Every
 * verdict is counted per status code.
 *
 * <p>Not thread-safe: one owner calls every method. No allocation after construction; all loops
 * bounded; no exceptions after construction.
 */
public final class ProperTimeTracker {
  /** Number of bytes {@link #save} writes. */
  public static final int STATE_BYTES = 4 + Status.COUNT * 4 + SampleValidator.STATE_BYTES
      + OrientationCache.STATE_BYTES + OffsetIntegrator.STATE_BYTES + OutageBridge.STATE_BYTES;

  private final ModelConfig config;
  private final RateModel model;
  private final SampleValidator validator;
  private final OrientationCache cache;
  private final OffsetIntegrator integrator;
  private final OutageBridge bridge;
  private final int[] counters = new int[Status.COUNT];
  private int lastSampleStatus = Status.NOT_READY;

  // Data in flight within one step (not state: every step writes them before reading them).
  private final SplitTime epoch = new SplitTime();
  private final double[] givenR = new double[3];
  private final double[] givenV = new double[3];
  private final double[] r = new double[3];
  private final double[] v = new double[3];
  private final double[] rb = new double[3];
  private final double[] pole = new double[3];
  private final RateComponents evaluated = new RateComponents();

  /**
   * Creates a tracker with its own coefficient table holding the configuration's field
   * (allocates all its working storage now).
   *
   * @param config the configuration
   */
  public ProperTimeTracker(ModelConfig config) {
    this(config, RateModel.gravityTableFor(config));
  }

  /**
   * Creates a tracker evaluating the active field of a coefficient table that its owner loads and
   * activates (the corrector's gravity uplink table).
   *
   * @param config the configuration
   * @param gravity the coefficient table (capacity the configured degree at level HARMONICS)
   */
  public ProperTimeTracker(ModelConfig config, GravityTable gravity) {
    this.config = config;
    this.model = new RateModel(config, gravity);
    this.validator = new SampleValidator(config);
    this.cache = new OrientationCache(config);
    this.integrator = new OffsetIntegrator(config.body());
    this.bridge = new OutageBridge(config);
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
  @CheckReturnValue
  public int step(SplitTime nowTt, OrbitSample sample) {
    if (sample != null) {
      final int verdict = validate(sample, nowTt);
      counters[verdict]++;
      lastSampleStatus = verdict;
      if (verdict == Status.OK) {
        return accept();
      }
      if (verdict == Status.REACQUIRING || verdict == Status.UNCONFIRMED) {
        validator.hold(epoch, r, v);
      }
      bridgeTo(nowTt);
      return verdict;
    }
    bridgeTo(nowTt);
    return bridge.solutionStatus();
  }

  private int validate(OrbitSample s, SplitTime nowTt) {
    final boolean initialized = integrator.isInitialized();
    final int first = validator.checkSample(s, nowTt, initialized, epoch, givenR, givenV);
    if (first != Status.OK) {
      return first;
    }
    cache.toInertial(epoch, s.frame(), givenR, givenV, r, v, rb);
    cache.pole(pole);
    final boolean reacquiring = initialized && bridge.solutionStatus() == Status.STALE;
    final int motion = validator.checkMotion(epoch, r, v, pole, initialized && !reacquiring);
    return motion != Status.OK || !reacquiring ? motion : validator.checkReacquisition(epoch, r, v, pole);
  }

  private int accept() {
    final boolean first = !integrator.isInitialized();
    model.evaluate(r, v, rb, pole, cache.bodies(), validator.inverseRadius(), evaluated);
    bridge.sampleAccepted(epoch, r, v, rb);
    validator.accepted(epoch);
    final double h = integrator.addNode(epoch, evaluated);
    return !first && h > 1.5 * config.nominalStepS() ? Status.LONG_STEP : Status.OK;
  }

  private void bridgeTo(SplitTime nowTt) {
    if (!integrator.isInitialized()) {
      return;
    }
    cache.pole(pole); // the pole of the last refresh: the bridge propagates about it
    if (!bridge.propagateTo(nowTt, integrator.secondsSinceNode(nowTt), pole)) {
      return;
    }
    bridge.copyState(r, v, rb);
    cache.bodyFixed(nowTt, r, rb); // also refreshes the pole
    cache.pole(pole);
    final double invR = 1.0 / Vec3.norm(r);
    model.evaluate(r, v, rb, pole, cache.bodies(), invR, evaluated);
    integrator.addNode(nowTt, evaluated);
    validator.referenceAt(nowTt, validator.energy(r, v, invR, pole));
    bridge.bridged(rb);
  }

  /**
   * Sets the offset at the first accepted sample (for example the clock's initial offset).
   *
   * @param offsetS offset in seconds added to every reported offset (|offset| up to 1000 s)
   * @return {@link Status#OK}, {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE}
   */
  @CheckReturnValue
  public int setInitialOffsetS(double offsetS) {
    return integrator.setInitialOffsetS(offsetS);
  }

  /**
   * Returns Delta tau at the last node (sample epoch or bridged cycle time), s.
   *
   * @return Delta tau at the last node, s
   */
  public double offsetS() {
    return integrator.offsetS();
  }

  /**
   * Delta tau extrapolated from the last node with the current rate.
   *
   * @param tt instant in TT
   * @return the offset at {@code tt}, s
   */
  public double offsetAtS(SplitTime tt) {
    return integrator.offsetAtS(tt);
  }

  /**
   * Delta tau extrapolated to an instant given as a base time plus a shift in seconds.
   *
   * @param base instant in TT
   * @param plusS seconds added to the base
   * @return the offset, s
   */
  public double offsetAtS(SplitTime base, double plusS) {
    return integrator.offsetAtS(base, plusS);
  }

  /**
   * Returns the secular part: the integral of g since the first sample, s.
   *
   * @return the secular part, s
   */
  public double secularOffsetS() {
    return integrator.secularOffsetS();
  }

  /**
   * Returns the periodic part -2 (r.v - r.v0)/c^2, s.
   *
   * @return the periodic part, s
   */
  public double periodicOffsetS() {
    return integrator.periodicOffsetS();
  }

  /**
   * Returns y at the last node.
   *
   * @return y at the last node
   */
  public double fractionalFrequency() {
    return integrator.rateTotal();
  }

  /**
   * Copies the components of the last evaluation.
   *
   * @param out receives the components
   */
  public void rate(RateComponents out) {
    integrator.nodeRate(out);
  }

  /**
   * Returns the bound on the extra fractional-frequency error while bridging (0 on fresh samples).
   *
   * @return the bound
   */
  public double rateErrorBound() {
    return bridge.rateErrorBound();
  }

  /**
   * Returns seconds since the last good sample at the last cycle (0 on fresh samples).
   *
   * @return seconds since the last good sample
   */
  public double bridgedForS() {
    return bridge.bridgedForS();
  }

  /**
   * Returns OK, DEGRADED_BRIDGED, STALE or NOT_READY.
   *
   * @return the solution status
   */
  public int solutionStatus() {
    return bridge.solutionStatus();
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
    return integrator.lastStepS();
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
   * How many slot refreshes of the frame cadence were computed at once instead of from values
   * staged over the cycles before ({@link OrientationCache#synchronousRefreshes}): those cycles
   * carry the full refresh cost.
   *
   * @return the count since construction
   */
  public int synchronousRefreshes() {
    return cache.synchronousRefreshes();
  }

  /**
   * The time of the last node.
   *
   * @param out receives the instant (TT)
   */
  public void nodeTime(SplitTime out) {
    integrator.nodeTime(out);
  }

  /**
   * One component of the current inertial position, m.
   *
   * @param axis 0..2
   * @return the component
   */
  public double inertialPositionM(int axis) {
    return bridge.positionM(axis);
  }

  /**
   * One component of the current inertial velocity, m/s.
   *
   * @param axis 0..2
   * @return the component
   */
  public double inertialVelocityMPerS(int axis) {
    return bridge.velocityMPerS(axis);
  }

  /**
   * Returns whether a first sample has been accepted.
   *
   * @return whether a first sample has been accepted
   */
  public boolean isInitialized() {
    return integrator.isInitialized();
  }

  /**
   * Writes the complete model state (not the configuration) for a warm restart.
   *
   * @param w the writer, positioned where the state goes
   */
  public void save(StateWriter w) {
    w.putInt(lastSampleStatus);
    for (int i = 0; i < Status.COUNT; i++) {
      w.putInt(counters[i]);
    }
    validator.save(w);
    cache.save(w);
    integrator.save(w);
    bridge.save(w);
  }

  /**
   * Restores the state written by {@link #save}, every field range- and finiteness-checked; the
   * integrator has a first node exactly when the solution status is not NOT_READY. The caller
   * checks the buffer's integrity (CRC, length, identity) first and puts the previous state back
   * when this refuses.
   *
   * @param r the reader, positioned at the state
   * @return {@link Status#OK}, or the reader's first refusal ({@link Status#BUFFER_TOO_SMALL},
   *     {@link Status#NOT_FINITE}, {@link Status#OUT_OF_RANGE})
   */
  @CheckReturnValue
  public int restore(StateReader r) {
    lastSampleStatus = r.getIntIn(0, Status.COUNT - 1);
    for (int i = 0; i < Status.COUNT; i++) {
      counters[i] = r.getIntIn(0, Integer.MAX_VALUE);
    }
    validator.restore(r);
    cache.restore(r);
    final int integratorAt = r.position();
    integrator.restore(r);
    bridge.restore(r);
    if (integrator.isInitialized() != (bridge.solutionStatus() != Status.NOT_READY)) {
      r.refuse(integratorAt);
    }
    return r.status();
  }
}
