package org.eigenzeit.onboard.tracker.bridging;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.math.Vec3;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitBridge;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The tracker's orbit state and its bridging across outages. It holds the state of the last node
 * (inertial position and velocity, body-fixed position) and the solution status:
 *
 * <pre>
 *   NOT_READY          no sample taken yet
 *   OK                 the last node is an accepted sample
 *   DEGRADED_BRIDGED   the last node is the last good state propagated by {@link OrbitBridge}
 *                      (RK4, monopole + J2) to the cycle time; rate error bound
 *                      bridgeRateErrorPerS x (time since the last good sample)
 *   STALE              the bridging limit has passed (or the span needs too many steps): no new
 *                      node; the tracker holds its last offset and rate
 * </pre>
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class OutageBridge {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 4 + 8 + 16 + 9 * 8;
  /** Largest bridged-for time accepted on restore, s. */
  private static final double MAX_SPAN_S = 1.0e12;

  private final OrbitBridge propagator;
  private final double bridgeLimitS;
  private final double bridgeStepS;
  private final double bridgeRateErrorPerS;
  private final double minRadius;
  private final double maxRadius;
  private final double maxSpeed;
  private final double[] r = new double[3];
  private final double[] v = new double[3];
  private final double[] rb = new double[3];
  private final SplitTime lastGoodSampleTt = new SplitTime();
  private double bridgedForS;
  private int solutionStatus = Status.NOT_READY;

  /**
   * Creates the bridge (status NOT_READY).
   *
   * @param config the model configuration (body, bridging step, limit and error growth)
   */
  public OutageBridge(ModelConfig config) {
    final CentralBody body = config.body();
    this.propagator = new OrbitBridge(body.gmM3PerS2(), body.referenceRadiusM(), body.j2());
    this.bridgeLimitS = config.bridgeLimitS();
    this.bridgeStepS = config.bridgeStepS();
    this.bridgeRateErrorPerS = config.bridgeRateErrorPerS();
    this.minRadius = 0.5 * body.minRadiusM();
    this.maxRadius = 2.0 * body.maxRadiusM();
    this.maxSpeed = 2.0 * body.maxSpeedMPerS();
  }

  /**
   * An accepted sample is the new state (solution OK).
   *
   * @param epoch the sample's epoch
   * @param rInertial its inertial position, m
   * @param vInertial its inertial velocity, m/s
   * @param rBodyFixed its body-fixed position, m
   */
  public void sampleAccepted(SplitTime epoch, double[] rInertial, double[] vInertial, double[] rBodyFixed) {
    Vec3.copy(rInertial, r);
    Vec3.copy(vInertial, v);
    Vec3.copy(rBodyFixed, rb);
    lastGoodSampleTt.setTo(epoch);
    bridgedForS = 0.0;
    solutionStatus = Status.OK;
  }

  /**
   * Propagates the state from the last node to the cycle time, if the bridging limit allows.
   *
   * @param nowTt the cycle time
   * @param span seconds from the last node to the cycle time
   * @param pole the pole about which J2 acts, inertial unit vector
   * @return true when the state was propagated (the caller evaluates the model there and adds a
   *     node, then calls {@link #bridged}); false when there is nothing to do (the cycle time is
   *     not after the node) or the limit has passed (status STALE)
   */
  public boolean propagateTo(SplitTime nowTt, double span, double[] pole) {
    if (!(span > 0)) {
      return false;
    }
    final double age = nowTt.secondsSince(lastGoodSampleTt);
    bridgedForS = age;
    if (age > bridgeLimitS) {
      solutionStatus = Status.STALE;
      return false;
    }
    propagator.setPole(pole);
    if (propagator.propagate(r, v, span, bridgeStepS) < 0) {
      solutionStatus = Status.STALE;
      return false;
    }
    return true;
  }

  /**
   * The propagated state has become a node: solution DEGRADED_BRIDGED.
   *
   * @param rBodyFixed the node's body-fixed position (copied), m
   */
  public void bridged(double[] rBodyFixed) {
    Vec3.copy(rBodyFixed, rb);
    solutionStatus = Status.DEGRADED_BRIDGED;
  }

  /**
   * Returns OK, DEGRADED_BRIDGED, STALE or NOT_READY.
   *
   * @return the solution status
   */
  public int solutionStatus() {
    return solutionStatus;
  }

  /**
   * Returns the bound on the extra fractional-frequency error while bridging (0 on fresh samples).
   *
   * @return the bound
   */
  public double rateErrorBound() {
    return solutionStatus == Status.OK ? 0.0 : bridgeRateErrorPerS * bridgedForS;
  }

  /**
   * Returns seconds since the last good sample at the last cycle (0 on fresh samples).
   *
   * @return seconds since the last good sample
   */
  public double bridgedForS() {
    return bridgedForS;
  }

  /**
   * Copies the state of the last node (after a propagation: the propagated state).
   *
   * @param rOut receives the inertial position, m
   * @param vOut receives the inertial velocity, m/s
   * @param rbOut receives the body-fixed position, m
   */
  public void copyState(double[] rOut, double[] vOut, double[] rbOut) {
    Vec3.copy(r, rOut);
    Vec3.copy(v, vOut);
    Vec3.copy(rb, rbOut);
  }

  /**
   * One component of the inertial position of the last node, m.
   *
   * @param axis 0..2
   * @return the component
   */
  public double positionM(int axis) {
    return r[axis];
  }

  /**
   * One component of the inertial velocity of the last node, m/s.
   *
   * @param axis 0..2
   * @return the component
   */
  public double velocityMPerS(int axis) {
    return v[axis];
  }

  /**
   * Writes the status and the state.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    w.putInt(solutionStatus);
    w.putDouble(bridgedForS);
    lastGoodSampleTt.save(w);
    for (int i = 0; i < 3; i++) {
      w.putDouble(r[i]);
      w.putDouble(v[i]);
      w.putDouble(rb[i]);
    }
  }

  /**
   * Restores the status (one of the four), the bridged-for time and the state; before the first
   * sample the state must be zero, after it the radius must lie within [r_min/2, 2 r_max] and the
   * speed below 2 v_max.
   *
   * @param reader the reader (refusals latch in it)
   */
  public void restore(StateReader reader) {
    final int at = reader.position();
    solutionStatus = reader.getIntIn(Status.OK, Status.NOT_READY);
    if (solutionStatus != Status.OK && solutionStatus != Status.DEGRADED_BRIDGED && solutionStatus != Status.STALE
        && solutionStatus != Status.NOT_READY) {
      reader.refuse(at);
    }
    bridgedForS = reader.getDoubleIn(0.0, MAX_SPAN_S);
    lastGoodSampleTt.restore(reader);
    final int stateAt = reader.position();
    for (int i = 0; i < 3; i++) {
      r[i] = reader.getDoubleIn(-maxRadius, maxRadius);
      v[i] = reader.getDoubleIn(-maxSpeed, maxSpeed);
      rb[i] = reader.getDoubleIn(-maxRadius, maxRadius);
    }
    final boolean empty = Vec3.norm(r) == 0.0 && Vec3.norm(v) == 0.0;
    final boolean plausible = Vec3.norm(r) >= minRadius && Vec3.norm(r) <= maxRadius && Vec3.norm(v) <= maxSpeed;
    if (solutionStatus == Status.NOT_READY ? !empty : !plausible) {
      reader.refuse(stateAt);
    }
  }
}
