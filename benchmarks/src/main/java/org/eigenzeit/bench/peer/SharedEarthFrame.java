package org.eigenzeit.bench.peer;

import org.eigenzeit.ground.instant.Instants;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.orekit.frames.FieldTransform;
import org.orekit.frames.Frame;
import org.orekit.frames.FramesFactory;
import org.orekit.frames.StaticTransform;
import org.orekit.frames.Transform;
import org.orekit.frames.TransformProvider;
import org.orekit.time.AbsoluteDate;
import org.orekit.time.FieldAbsoluteDate;

/**
 * An Orekit Earth-fixed frame (child of GCRF) whose rotation is the one our reference uses: the
 * onboard {@link EarthOrientation} in STRICT mode, evaluated in full at every call, at the same
 * TT instant (t0 plus the same seconds) and the same UT1 - TT. So both sides rotate the
 * satellite into the Earth-fixed frame with bit-identical matrices; Orekit needs no EOP data.
 *
 * <p>Not thread-safe (one EarthOrientation per frame): one frame per propagation.
 */
final class SharedEarthFrame implements TransformProvider {
  private static final long serialVersionUID = 1L;
  private final transient EarthOrientation orientation;
  private final transient SplitTime t0;
  private final transient AbsoluteDate date0;
  private final transient double ut1MinusTtS;
  private final transient double rotationRate;
  private final transient SplitTime now = new SplitTime();
  private transient long calls;

  SharedEarthFrame(SplitTime t0, AbsoluteDate date0, double ut1MinusTtS, double rotationRateRadPerS) {
    this.orientation = new EarthOrientation(MathMode.STRICT, rotationRateRadPerS);
    this.t0 = SplitTime.of(t0.wholeSeconds(), t0.fractionS());
    this.date0 = date0;
    this.ut1MinusTtS = ut1MinusTtS;
    this.rotationRate = rotationRateRadPerS;
  }

  /**
   * The frame for Orekit's gravity model.
   *
   * @return a new frame below GCRF
   */
  Frame frame() {
    return new Frame(FramesFactory.getGCRF(), this, "Earth-fixed (shared rotation)", false);
  }

  /**
   * Returns how many times the rotation was evaluated.
   *
   * @return the count
   */
  long calls() {
    return calls;
  }

  /** GCRS-to-ITRS rotation at the date, as ForceModel.evaluate forms it (t0 plus seconds). */
  private Rotation rotation(AbsoluteDate date) {
    now.setTo(t0);
    Instants.shift(now, date.durationFrom(date0));
    orientation.update(now, ut1MinusTtS);
    calls++;
    final double[][] m = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        m[i][j] = orientation.matrixElement(i, j);
      }
    }
    // Hipparchus: the rotation built from m maps parent (GCRF) coordinates u to m u.
    return new Rotation(m, 1e-10);
  }

  @Override
  public Transform getTransform(AbsoluteDate date) {
    return new Transform(date, rotation(date), new Vector3D(rotationRate, Vector3D.PLUS_K));
  }

  @Override
  public StaticTransform getStaticTransform(AbsoluteDate date) {
    return StaticTransform.of(date, rotation(date));
  }

  @Override
  public <T extends CalculusFieldElement<T>> FieldTransform<T> getTransform(FieldAbsoluteDate<T> date) {
    throw new UnsupportedOperationException("field transforms are not used by this benchmark");
  }
}
