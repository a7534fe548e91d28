package org.eigenzeit.ground.reference;

import org.eigenzeit.ground.instant.Instants;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.orekit.forces.gravity.J2OnlyPerturbation;
import org.orekit.frames.Frame;
import org.orekit.frames.FramesFactory;
import org.orekit.frames.FieldTransform;
import org.orekit.frames.Transform;
import org.orekit.frames.TransformProvider;
import org.orekit.time.FieldAbsoluteDate;
import org.hipparchus.CalculusFieldElement;
import org.orekit.orbits.CartesianOrbit;
import org.orekit.orbits.OrbitType;
import org.orekit.propagation.SpacecraftState;
import org.orekit.propagation.numerical.NumericalPropagator;
import org.orekit.time.AbsoluteDate;
import org.orekit.time.TimeScalesFactory;
import org.orekit.utils.PVCoordinates;

/**
 * The reference's orbit against Orekit 13 (an independent general-purpose flight-dynamics library
 * from the registry, test scope only) for a J2-only field over one day. Orekit's J2 acts about the
 * z axis of a frame we give it: a frame whose z follows the Earth pole of our reference (the CIP
 * moves by about 3e-7 rad in a day through precession-nutation, which a fixed frame would turn into
 * decimetres of disagreement).
 */
class OrekitJ2CrossCheckTest {
  @Test
  void oneDayJ2OnlyOrbitAgreesWithOrekit() {
    final double gm = CentralBody.EARTH.gmM3PerS2();
    final double re = 6_378_136.3;
    final double c20 = -4.84165371736e-4;
    final double j2 = -Math.sqrt(5) * c20;
    final GravityField field = GravityField.builder(gm, re, 2).set(2, 0, c20, 0).build();
    final SplitTime t0 = SplitTime.of(846_000_000L, 0.0);
    final ReferenceConfig cfg = ReferenceConfig.earth(2).withField(field, 2).withThirdBodies(null)
        .withIntegrator(ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853, 1e-14);
    final double[] r0 = {7.0e6, 1.0e5, -2.0e5};
    final double[] v0 = {100.0, 4500.0, 6000.0};
    final double day = 86_400.0;
    final ReferenceTrajectory ours = new ReferencePropagator(cfg).propagate(t0, r0, v0, day);

    final AbsoluteDate date0 = new AbsoluteDate(2026, 10, 22, 0, 0, 0.0, TimeScalesFactory.getTT());
    final Frame gcrf = FramesFactory.getGCRF();
    final Frame poleFrame = new Frame(gcrf, new PoleFollower(t0, date0), "pole-aligned", true);
    final CartesianOrbit orbit = new CartesianOrbit(new PVCoordinates(new Vector3D(r0[0], r0[1], r0[2]),
        new Vector3D(v0[0], v0[1], v0[2])), gcrf, date0, gm);
    final double[][] tol = NumericalPropagator.tolerances(1e-6, orbit, OrbitType.CARTESIAN);
    final NumericalPropagator prop = new NumericalPropagator(new DormandPrince853Integrator(1e-3, 300, tol[0], tol[1]));
    prop.setOrbitType(OrbitType.CARTESIAN);
    prop.setInitialState(new SpacecraftState(orbit));
    prop.addForceModel(new J2OnlyPerturbation(gm, re, j2, poleFrame));
    double worst = 0;
    final double[] r = new double[3];
    final double[] v = new double[3];
    for (double t = 3600; t <= day; t += 3600) {
      final Vector3D p = prop.propagate(date0.shiftedBy(t)).getPVCoordinates(gcrf).getPosition();
      ours.state(t, r, v);
      worst = Math.max(worst, p.distance(new Vector3D(r[0], r[1], r[2])));
    }
    System.out.printf("J2-only LEO, one day: reference vs Orekit worst position difference %.3e m%n", worst);
    System.out.printf("evidence: reference.orekit_j2_position_m = %.3e bound 3.0e-4%n", worst);
    // 10x the measured 3.0e-5 m (requirement EZ-REF-03: 1 mm).
    assertTrue(worst < 3.0e-4, "worst " + worst + " m");
  }

  /** An Orekit frame provider whose z axis is the reference's Earth pole at each date. */
  private static final class PoleFollower implements TransformProvider {
    private static final long serialVersionUID = 1L;
    private final transient EarthOrientation eo =
        new EarthOrientation(MathMode.STRICT, CentralBody.EARTH.rotationRateRadPerS());
    private final transient SplitTime t0;
    private final transient AbsoluteDate date0;

    PoleFollower(SplitTime t0, AbsoluteDate date0) {
      this.t0 = t0;
      this.date0 = date0;
    }

    @Override
    public Transform getTransform(AbsoluteDate date) {
      final SplitTime t = SplitTime.of(t0.wholeSeconds(), t0.fractionS());
      Instants.shift(t, date.durationFrom(date0));
      eo.update(t, -69.2);
      final double[] pole = new double[3];
      eo.poleInGcrs(pole);
      return new Transform(date, new Rotation(new Vector3D(pole[0], pole[1], pole[2]), Vector3D.PLUS_K));
    }

    @Override
    public <T extends CalculusFieldElement<T>> FieldTransform<T> getTransform(FieldAbsoluteDate<T> date) {
      throw new UnsupportedOperationException("field transforms are not needed here");
    }
  }
}
