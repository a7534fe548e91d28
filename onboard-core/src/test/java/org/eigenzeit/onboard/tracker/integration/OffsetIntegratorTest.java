package org.eigenzeit.onboard.tracker.integration;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.RateComponents;
import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The offset integrator against calculus: its rule is third order, so it integrates a quadratic
 * integrand exactly on any steps within a factor 4 of each other, and falls back to the
 * trapezoid beyond, whose result exceeds the integral by g'' h^3/12 per step (a textbook result).
 */
class OffsetIntegratorTest {
  private static final long T0 = 850_000_000L;
  private final OffsetIntegrator integrator = new OffsetIntegrator(CentralBody.EARTH);
  private final RateComponents values = new RateComponents();

  /** Writes (y, r.v, g) into the node holder through its public restore. */
  private void node(double y, double rDotV, double g) {
    final byte[] b = StateBytes.written(w -> {
      for (int i = 0; i < 5; i++) {
        w.putDouble(0.0);
      }
      w.putDouble(y);
      w.putDouble(rDotV);
      w.putDouble(g);
    });
    final StateReader r = StateBytes.reader(b);
    values.restore(r, 1e-6, 1e20);
    assertEquals(Status.OK, r.status());
  }

  private static SplitTime at(double t) {
    final double whole = Math.floor(t);
    return SplitTime.of(T0 + (long) whole, t - whole);
  }

  private static double g(double t) {
    return 1e-10 + 3e-14 * t - 2e-17 * t * t;
  }

  private static double antiderivative(double t) {
    return 1e-10 * t + 1.5e-14 * t * t - 2e-17 * t * t * t / 3;
  }

  @Test
  void stateSizeIsWhatItWrites() {
    assertEquals(OffsetIntegrator.STATE_BYTES, StateBytes.written(integrator::save).length);
  }

  @Test
  void quadraticIntegrandIsIntegratedExactlyOnUnequalSteps() {
    final double[] times = {0, 1, 2, 3.5, 5, 6, 8, 11, 12, 13, 14};
    for (double t : times) {
      node(g(t), 0, g(t));
      integrator.addNode(at(t), values);
    }
    // The first step is a trapezoid (no older node): it adds g'' h^3 / 12 = -4e-17/12.
    final double trapezoidError = -4e-17 / 12;
    assertEquals(antiderivative(14) + trapezoidError, integrator.secularOffsetS(), 1e-24);
  }

  @Test
  void stepsMoreThanFourTimesApartFallBackToTheTrapezoid() {
    final double[] times = {0, 1, 2, 12};
    for (double t : times) {
      node(g(t), 0, g(t));
      integrator.addNode(at(t), values);
    }
    // Steps 1 (trapezoid), 1 (third order, exact), 10 (trapezoid again): -4e-17/12 (1 + 1000).
    assertEquals(antiderivative(12) - 4e-17 / 12 * 1001, integrator.secularOffsetS(), 1e-24);
    assertEquals(10.0, integrator.lastStepS(), 0.0);
  }

  @Test
  void periodicTermIsTheExactRDotVDifference() {
    node(0, 5.0e10, 0);
    integrator.addNode(SplitTime.of(T0, 0), values);
    node(0, -2.0e10, 0);
    integrator.addNode(SplitTime.of(T0 + 1, 0), values);
    assertEquals(-2 * (-7.0e10) / (299_792_458.0 * 299_792_458.0), integrator.periodicOffsetS(), 1e-24);
    assertEquals(Status.OK, integrator.setInitialOffsetS(1e-3));
    assertEquals(Status.NOT_FINITE, integrator.setInitialOffsetS(Double.NaN));
    assertEquals(Status.OUT_OF_RANGE, integrator.setInitialOffsetS(1e4));
    assertEquals(1e-3 + integrator.periodicOffsetS(), integrator.offsetS(), 1e-24);
  }

  @Test
  void restoreRoundTripsAndRefusesBadValues() {
    node(1e-10, 4e10, 1.2e-10);
    integrator.addNode(SplitTime.of(T0, 0.25), values);
    node(1.1e-10, 3e10, 1.3e-10);
    integrator.addNode(SplitTime.of(T0 + 1, 0.25), values);
    final byte[] good = StateBytes.written(integrator::save);
    final OffsetIntegrator other = new OffsetIntegrator(CentralBody.EARTH);
    StateReader r = StateBytes.reader(good);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    assertArrayEquals(good, StateBytes.written(other::save));
    r = StateBytes.reader(StateBytes.withInt(good, 0, 2));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a flag other than 0 or 1");
    r = StateBytes.reader(StateBytes.withDouble(good, 4, Double.NaN));
    other.restore(r);
    assertEquals(Status.NOT_FINITE, r.status(), "NaN integrand");
    r = StateBytes.reader(StateBytes.withDouble(good, good.length - 8, 1.0));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "g = 1 is no weak field");
  }
}
