package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.math.MathMode;

/**
 * Immutable configuration of the rate model and the offset tracker. Built once, before flight
 * operations, with {@link #builder()}; {@link Builder#build()} throws on a bad value (a
 * construction-time programmer or configuration error, never on the hot path).
 *
 * <p>Defaults: Earth, HARMONICS to degree 8 of EGM96, tides on, c^-4 off, FAST math,
 * UT1 - TT = -69.2 s, nominal step 1 s, bridging with a 10 s step for up to 1800 s.
 */
public final class ModelConfig {
  final CentralBody body;
  final ModelLevel level;
  final int degree;
  final GravityField field;
  final boolean tides;
  final boolean c4;
  final MathMode math;
  final double ut1MinusTtS;
  final double nominalStepS;
  final double bridgeStepS;
  final double bridgeLimitS;
  final double energyToleranceRel;
  final double energyDriftM2PerS3;
  final double maxSampleAgeS;
  final double futureToleranceS;
  final double bridgeRateErrorPerS;

  private ModelConfig(Builder b) {
    this.body = b.body;
    this.level = b.level;
    this.degree = b.degree;
    this.field = b.field;
    this.tides = b.tides;
    this.c4 = b.c4;
    this.math = b.math;
    this.ut1MinusTtS = b.ut1MinusTtS;
    this.nominalStepS = b.nominalStepS;
    this.bridgeStepS = b.bridgeStepS;
    this.bridgeLimitS = b.bridgeLimitS;
    this.energyToleranceRel = b.energyToleranceRel;
    this.energyDriftM2PerS3 = b.energyDriftM2PerS3;
    this.maxSampleAgeS = b.maxSampleAgeS;
    this.futureToleranceS = b.futureToleranceS;
    this.bridgeRateErrorPerS = b.bridgeRateErrorPerS;
  }

  /**
   * Returns a builder with the defaults.
   *
   * @return a builder with the defaults
   */
  public static Builder builder() {
    return new Builder();
  }

  /**
   * Returns a builder holding this configuration's values.
   *
   * @return a builder holding this configuration's values
   */
  public Builder toBuilder() {
    final Builder b = new Builder();
    b.body = body;
    b.level = level;
    b.degree = degree;
    b.field = field;
    b.tides = tides;
    b.c4 = c4;
    b.math = math;
    b.ut1MinusTtS = ut1MinusTtS;
    b.nominalStepS = nominalStepS;
    b.bridgeStepS = bridgeStepS;
    b.bridgeLimitS = bridgeLimitS;
    b.energyToleranceRel = energyToleranceRel;
    b.energyDriftM2PerS3 = energyDriftM2PerS3;
    b.maxSampleAgeS = maxSampleAgeS;
    b.futureToleranceS = futureToleranceS;
    b.bridgeRateErrorPerS = bridgeRateErrorPerS;
    return b;
  }

  /**
   * Returns the central body.
   *
   * @return the central body
   */
  public CentralBody body() {
    return body;
  }

  /**
   * Returns the gravity model level.
   *
   * @return the gravity model level
   */
  public ModelLevel level() {
    return level;
  }

  /**
   * Returns the harmonic degree (used at level HARMONICS).
   *
   * @return the harmonic degree (used at level HARMONICS)
   */
  public int degree() {
    return degree;
  }

  /**
   * Returns whether the lunisolar (or Earth-Sun) tidal term is on.
   *
   * @return whether the lunisolar (or Earth-Sun) tidal term is on
   */
  public boolean tides() {
    return tides;
  }

  /**
   * Returns whether the c^-4 terms are on.
   *
   * @return whether the c^-4 terms are on
   */
  public boolean c4() {
    return c4;
  }

  /**
   * Returns the math mode.
   *
   * @return the math mode
   */
  public MathMode math() {
    return math;
  }

  /**
   * Returns the bridging limit, s.
   *
   * @return the bridging limit, s
   */
  public double bridgeLimitS() {
    return bridgeLimitS;
  }

  /** Mutable builder; not thread-safe. */
  public static final class Builder {
    private CentralBody body = CentralBody.EARTH;
    private ModelLevel level = ModelLevel.HARMONICS;
    private int degree = 8;
    private GravityField field;
    private boolean tides = true;
    private boolean c4;
    private MathMode math = MathMode.FAST;
    private double ut1MinusTtS = -69.2;
    private double nominalStepS = 1.0;
    private double bridgeStepS = 10.0;
    private double bridgeLimitS = 1800.0;
    private double energyToleranceRel = 1.0e-4;
    private double energyDriftM2PerS3 = 1.0;
    private double maxSampleAgeS = 30.0;
    private double futureToleranceS = 1.0;
    private double bridgeRateErrorPerS = 5.0e-18;

    private Builder() {}

    /**
     * Sets the central body.
     *
     * @param v central body
     * @return this
     */
    public Builder body(CentralBody v) {
      body = v;
      return this;
    }

    /**
     * Sets the model level.
     *
     * @param v model level
     * @return this
     */
    public Builder level(ModelLevel v) {
      level = v;
      return this;
    }

    /**
     * Sets the harmonic degree, 2 to the field's capacity (level HARMONICS).
     *
     * @param v harmonic degree, 2 to the field's capacity (level HARMONICS)
     * @return this
     */
    public Builder degree(int v) {
      degree = v;
      return this;
    }

    /**
     * Sets the coefficient table (default: EGM96 to the set degree, for the Earth).
     *
     * @param v coefficient table (default: EGM96 to the set degree, for the Earth)
     * @return this
     */
    public Builder field(GravityField v) {
      field = v;
      return this;
    }

    /**
     * Sets the tides on or off.
     *
     * @param v tides on or off
     * @return this
     */
    public Builder tides(boolean v) {
      tides = v;
      return this;
    }

    /**
     * Sets the c^-4 terms on or off.
     *
     * @param v c^-4 terms on or off
     * @return this
     */
    public Builder c4(boolean v) {
      c4 = v;
      return this;
    }

    /**
     * Sets the math mode.
     *
     * @param v math mode
     * @return this
     */
    public Builder math(MathMode v) {
      math = v;
      return this;
    }

    /**
     * Sets the UT1 - TT, s (|v| below 1000).
     *
     * @param v UT1 - TT, s (|v| below 1000)
     * @return this
     */
    public Builder ut1MinusTtS(double v) {
      ut1MinusTtS = v;
      return this;
    }

    /**
     * Sets the nominal integration step, s; longer steps are reported as LONG_STEP.
     *
     * @param v nominal integration step, s; longer steps are reported as LONG_STEP
     * @return this
     */
    public Builder nominalStepS(double v) {
      nominalStepS = v;
      return this;
    }

    /**
     * Sets the bridging integrator step, s (0.1 to 60).
     *
     * @param v bridging integrator step, s (0.1 to 60)
     * @return this
     */
    public Builder bridgeStepS(double v) {
      bridgeStepS = v;
      return this;
    }

    /**
     * Sets the longest bridging span before refusing, s.
     *
     * @param v longest bridging span before refusing, s
     * @return this
     */
    public Builder bridgeLimitS(double v) {
      bridgeLimitS = v;
      return this;
    }

    /**
     * Sets the relative energy tolerance of the vis-viva check.
     *
     * @param v relative energy tolerance of the vis-viva check
     * @return this
     */
    public Builder energyToleranceRel(double v) {
      energyToleranceRel = v;
      return this;
    }

    /**
     * Sets the energy drift allowance per second of gap, m^2/s^3.
     *
     * @param v energy drift allowance per second of gap, m^2/s^3
     * @return this
     */
    public Builder energyDriftM2PerS3(double v) {
      energyDriftM2PerS3 = v;
      return this;
    }

    /**
     * Sets the oldest sample accepted, s before the cycle time.
     *
     * @param v oldest sample accepted, s before the cycle time
     * @return this
     */
    public Builder maxSampleAgeS(double v) {
      maxSampleAgeS = v;
      return this;
    }

    /**
     * Sets the how far a sample may lie after the cycle time, s.
     *
     * @param v how far a sample may lie after the cycle time, s
     * @return this
     */
    public Builder futureToleranceS(double v) {
      futureToleranceS = v;
      return this;
    }

    /**
     * Sets the growth of the fractional-frequency error bound per second of bridging, 1/s.
     *
     * @param v growth of the fractional-frequency error bound per second of bridging, 1/s
     * @return this
     */
    public Builder bridgeRateErrorPerS(double v) {
      bridgeRateErrorPerS = v;
      return this;
    }

    /**
     * Checks the values and builds the configuration. Loads the default EGM96 table when the level
     * is HARMONICS and no field was given (construction-time allocation).
     *
     * @return the configuration
     * @throws IllegalArgumentException for a value out of range
     */
    public ModelConfig build() {
      check(body != null && level != null && math != null, "body, level and math are required");
      check(Math.abs(ut1MinusTtS) < 1000.0, "UT1 - TT out of range");
      check(nominalStepS > 0 && nominalStepS <= 3600.0, "nominal step out of range");
      check(bridgeStepS >= 0.1 && bridgeStepS <= 60.0, "bridge step must be 0.1..60 s");
      check(bridgeLimitS >= 0 && bridgeLimitS / bridgeStepS <= OrbitBridge.MAX_STEPS_PER_CALL * 16.0,
          "bridge limit too long for the bridge step");
      check(energyToleranceRel > 0 && energyToleranceRel < 1, "energy tolerance out of range");
      check(energyDriftM2PerS3 >= 0 && Double.isFinite(energyDriftM2PerS3), "energy drift out of range");
      check(maxSampleAgeS > 0 && maxSampleAgeS < 1e6, "sample age out of range");
      check(futureToleranceS >= 0 && futureToleranceS < 1e6, "future tolerance out of range");
      check(bridgeRateErrorPerS >= 0 && bridgeRateErrorPerS < 1e-9, "bridge error growth out of range");
      if (level == ModelLevel.HARMONICS) {
        check(body.centre() == CentralBody.CENTRE_EARTH,
            "level HARMONICS needs an Earth-fixed frame: use J2 for the Moon");
        if (field == null) {
          check(degree >= 2 && degree <= 36, "degree must be 2..36 for the shipped EGM96");
          field = GravityField.egm96(degree);
        }
        check(degree >= 2 && degree <= field.capacityDegree(), "degree out of the field's range");
      }
      return new ModelConfig(this);
    }

    private static void check(boolean ok, String message) {
      if (!ok) {
        throw new IllegalArgumentException(message);
      }
    }
  }
}
