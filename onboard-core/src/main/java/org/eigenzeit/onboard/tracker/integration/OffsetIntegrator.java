package org.eigenzeit.onboard.tracker.integration;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.math.CompensatedSum;
import org.eigenzeit.onboard.relativity.RateComponents;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The proper-time offset {@code Delta tau(t) = integral of y dT} from the rate model's values at
 * successive nodes (sample epochs or bridged cycle times), by an exact identity plus the
 * quadrature of a smooth remainder. Along any trajectory {@code y = g - (2/c^2) d(r.v)/dt} with
 * {@code g = y + 2 (v^2 + r.a)/c^2}, so
 *
 * <pre>
 *   Delta tau(t) = offset0 - 2 (r.v(t) - r.v(t0))/c^2  +  integral_{t0}^{t} g dt      (periodic + secular)
 * </pre>
 *
 * The first term carries the whole eccentricity term (IS-GPS-200 F e sqrt(A) sin E) exactly at
 * every node. g is integrated by a third-order rule: the trapezoid plus the curvature correction
 * of the quadratic through the last three nodes, {@code -f[t0,t1,t2] h^3/6} (Newton divided
 * differences; for equal steps {@code h/12 (-g0 + 8 g1 + 5 g2)}), falling back to the trapezoid
 * when consecutive steps differ by more than 4x; summation is Neumaier-compensated. Error per
 * step h: {@code O(h^4 max|g'''|)}; measured sizes in docs/algorithms.md section 4.
 *
 * <p>Use: the caller evaluates the model at the new node and passes its values to {@link
 * #addNode}.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class OffsetIntegrator {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 4 + 7 * 8 + 16 + RateComponents.STATE_BYTES;
  /** Largest |initial offset| accepted, s. */
  public static final double MAX_INITIAL_OFFSET_S = 1.0e3;

  private static final double MINUS_TWO_OVER_C2 = -2.0 / CentralBody.C2;
  /** Largest |secular offset| accepted on restore, s (1e-8 of rate over a century is 32 s). */
  private static final double MAX_SECULAR_S = 1.0e3;
  /** Largest |g| accepted on restore (weak field: |y| below 1e-8). */
  private static final double MAX_RATE = 1.0e-6;
  /** Largest integration step accepted on restore, s. */
  private static final double MAX_STEP_S = 1.0e12;

  private final RateComponents rate = new RateComponents();
  private final CompensatedSum secular = new CompensatedSum();
  private final SplitTime nodeTt = new SplitTime();
  private final double maxRDotV;
  private boolean initialized;
  private double previousIntegrand;
  private double olderIntegrand;
  private double rDotV0;
  private double initialOffsetS;
  private double lastStepS;

  /**
   * Creates an integrator with no node.
   *
   * @param body the central body (bounds the restored r.v)
   */
  public OffsetIntegrator(CentralBody body) {
    this.maxRDotV = 8.0 * body.maxRadiusM() * body.maxSpeedMPerS();
  }

  /**
   * Takes the model's values at {@code tt} as a new node: the first node starts the integration
   * (the periodic term's origin), every later one adds the integral over the step.
   *
   * @param tt the node's time in TT (normally after the previous node)
   * @param atNode the model's values at the node (copied)
   * @return the step from the previous node, s (0 for the first node)
   */
  public double addNode(SplitTime tt, RateComponents atNode) {
    rate.setTo(atNode);
    double h = 0.0;
    if (!initialized) {
      initialized = true;
      rDotV0 = rate.rDotVM2PerS();
      secular.reset();
      lastStepS = 0.0;
    } else {
      h = tt.secondsSince(nodeTt);
      integrate(h);
    }
    previousIntegrand = rate.integrandRate();
    nodeTt.setTo(tt);
    return h;
  }

  /**
   * Adds the integral of g over the last interval [t1, t2] of length h: the trapezoid, plus the
   * curvature correction of the quadratic through the two previous nodes when the steps are
   * comparable (for equal steps it is h/12 (-g0 + 8 g1 + 5 g2)).
   */
  private void integrate(double h) {
    final double g2 = rate.integrandRate();
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

  /**
   * Sets the offset added to every reported offset (for example the clock's initial offset).
   *
   * @param offsetS the offset, s (finite, |offset| up to {@value #MAX_INITIAL_OFFSET_S})
   * @return {@link Status#OK}, {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE} (the
   *     offset is then unchanged)
   */
  @CheckReturnValue
  public int setInitialOffsetS(double offsetS) {
    if (!Double.isFinite(offsetS)) {
      return Status.NOT_FINITE;
    }
    if (Math.abs(offsetS) > MAX_INITIAL_OFFSET_S) {
      return Status.OUT_OF_RANGE;
    }
    initialOffsetS = offsetS;
    return Status.OK;
  }

  /**
   * Returns Delta tau at the last node, s.
   *
   * @return Delta tau at the last node, s
   */
  public double offsetS() {
    return initialOffsetS + secular.value() + periodicOffsetS();
  }

  /**
   * Delta tau extrapolated from the last node with its rate.
   *
   * @param tt instant in TT
   * @return the offset at {@code tt}, s
   */
  public double offsetAtS(SplitTime tt) {
    return offsetS() + rate.total() * tt.secondsSince(nodeTt);
  }

  /**
   * Delta tau extrapolated to a base time plus a shift in seconds (a time and its correction
   * formed without an intermediate normalisation).
   *
   * @param base instant in TT
   * @param plusS seconds added to the base
   * @return the offset, s
   */
  public double offsetAtS(SplitTime base, double plusS) {
    return offsetS() + rate.total() * (base.secondsSince(nodeTt) + plusS);
  }

  /**
   * Returns the secular part: the integral of g since the first node, s.
   *
   * @return the secular part, s
   */
  public double secularOffsetS() {
    return secular.value();
  }

  /**
   * Returns the periodic part -2 (r.v - r.v0)/c^2 (0 before the first node), s.
   *
   * @return the periodic part, s
   */
  public double periodicOffsetS() {
    return initialized ? MINUS_TWO_OVER_C2 * (rate.rDotVM2PerS() - rDotV0) : 0.0;
  }

  /**
   * Returns the length of the last integration step, s.
   *
   * @return the step, s
   */
  public double lastStepS() {
    return lastStepS;
  }

  /**
   * Returns whether a first node has been taken.
   *
   * @return whether a first node has been taken
   */
  public boolean isInitialized() {
    return initialized;
  }

  /**
   * Copies the time of the last node.
   *
   * @param out receives the instant in TT
   */
  public void nodeTime(SplitTime out) {
    out.setTo(nodeTt);
  }

  /**
   * Seconds from the last node to an instant.
   *
   * @param tt the instant in TT
   * @return tt - node, s
   */
  public double secondsSinceNode(SplitTime tt) {
    return tt.secondsSince(nodeTt);
  }

  /**
   * Returns y at the last node.
   *
   * @return the fractional frequency
   */
  public double rateTotal() {
    return rate.total();
  }

  /**
   * Copies the model's values at the last node.
   *
   * @param out receives them
   */
  public void nodeRate(RateComponents out) {
    out.setTo(rate);
  }

  /**
   * Writes the integration state.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    w.putBoolean(initialized);
    w.putDouble(previousIntegrand);
    w.putDouble(olderIntegrand);
    w.putDouble(rDotV0);
    w.putDouble(initialOffsetS);
    w.putDouble(lastStepS);
    w.putDouble(secular.high());
    w.putDouble(secular.low());
    nodeTt.save(w);
    rate.save(w);
  }

  /**
   * Restores the integration state; every value range- and finiteness-checked.
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    initialized = r.getFlag();
    previousIntegrand = r.getDoubleIn(-MAX_RATE, MAX_RATE);
    olderIntegrand = r.getDoubleIn(-MAX_RATE, MAX_RATE);
    rDotV0 = r.getDoubleIn(-maxRDotV, maxRDotV);
    initialOffsetS = r.getDoubleIn(-MAX_INITIAL_OFFSET_S, MAX_INITIAL_OFFSET_S);
    lastStepS = r.getDoubleIn(-MAX_STEP_S, MAX_STEP_S); // negative after a sample older than a bridged node
    final double hi = r.getDoubleIn(-MAX_SECULAR_S, MAX_SECULAR_S);
    final double lo = r.getDoubleIn(-MAX_SECULAR_S, MAX_SECULAR_S);
    secular.set(hi, lo);
    nodeTt.restore(r);
    rate.restore(r, MAX_RATE, maxRDotV);
  }
}
