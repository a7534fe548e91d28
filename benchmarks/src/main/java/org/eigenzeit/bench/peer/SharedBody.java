package org.eigenzeit.bench.peer;

import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.FieldVector3D;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.orekit.frames.Frame;
import org.orekit.frames.FramesFactory;
import org.orekit.time.AbsoluteDate;
import org.orekit.time.FieldAbsoluteDate;
import org.orekit.utils.ExtendedPositionProvider;
import org.orekit.utils.TimeStampedPVCoordinates;

/**
 * The Sun or the Moon for Orekit's third-body attraction, from our {@link ThirdBodies} (the DE405
 * reader): geocentric position on GCRS axes at the TT seconds since J2000.0 of the date, the same
 * call our reference's force model makes.
 */
final class SharedBody implements ExtendedPositionProvider {
  private static final long serialVersionUID = 1L;
  private final transient ThirdBodies bodies;
  private final transient boolean sun;
  private final transient Frame gcrf = FramesFactory.getGCRF();
  private final transient double[] out = new double[3];
  private transient long calls;

  SharedBody(ThirdBodies bodies, boolean sun) {
    this.bodies = bodies;
    this.sun = sun;
  }

  /**
   * Returns how many positions were asked for.
   *
   * @return the count
   */
  long calls() {
    return calls;
  }

  @Override
  public Vector3D getPosition(AbsoluteDate date, Frame frame) {
    if (frame != gcrf) {
      throw new IllegalArgumentException("positions are given in GCRF only, asked in " + frame.getName());
    }
    final double t = date.durationFrom(AbsoluteDate.J2000_EPOCH);
    if (sun) {
      bodies.sunGeocentricM(t, out);
    } else {
      bodies.moonGeocentricM(t, out);
    }
    calls++;
    return new Vector3D(out[0], out[1], out[2]);
  }

  @Override
  public TimeStampedPVCoordinates getPVCoordinates(AbsoluteDate date, Frame frame) {
    throw new UnsupportedOperationException("only positions are shared (the third-body attraction needs no velocity)");
  }

  @Override
  public <T extends CalculusFieldElement<T>> FieldVector3D<T> getPosition(FieldAbsoluteDate<T> date, Frame frame) {
    throw new UnsupportedOperationException("field positions are not used by this benchmark");
  }
}
