package org.eigenzeit.ground.reference;

import org.eigenzeit.ground.instant.Instants;
import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Accelerations and clock rate of the reference, in the body-centred inertial frame (GCRS for
 * the Earth, ICRF axes for the Moon).
 *
 * <ul>
 *   <li>Earth: EGM96 to the configured degree by {@link Cunningham}, rotated with the onboard
 *       core's EarthOrientation evaluated in full at every call (no slot cache);
 *   <li>Moon: monopole plus J2 about the DE405 pole (libration angles);
 *   <li>third bodies: point masses, indirect (body-centred) form a = GM_b [(s - r)/|s - r|^3 -
 *       s/|s|^3] (Montenbruck and Gill 2000, eq. 3.37);
 *   <li>solar radiation pressure: cannonball, a = nu P Cr (A/m) (AU/|r - s|)^2 (r - s)/|r - s|,
 *       P = 4.56e-6 N/m^2, with the conical shadow of the central body (Montenbruck and Gill
 *       2000, section 3.4.2, eqs. 3.85-3.90);
 *   <li>drag: a = -1/2 Cd (A/m) rho |v_r| v_r, v_r = v - omega x r, with {@link
 *       ExponentialAtmosphere} (Earth only).
 * </ul>
 *
 * <p>Clock rate: y = -(v^2/2 + U - W0)/c^2, U = GM/r + U_h + U_tid, or the c^-4 form of IERS
 * Conventions (2010) ch. 10 (same expansion as the onboard core). Not thread-safe: one per run.
 */
final class ForceModel {
  static final double SOLAR_PRESSURE_N_PER_M2 = 4.56e-6;
  static final double AU_M = 149_597_870_691.0;
  static final double SUN_RADIUS_M = 6.96e8;
  static final double GM_SUN = ReferenceConfig.GM_SUN_M3_PER_S2;
  static final double GM_MOON = ReferenceConfig.GM_MOON_M3_PER_S2;
  private static final double C2 = CentralBody.C2;

  private final ReferenceConfig cfg;
  private final CentralBody body;
  private final boolean earth;
  private final SplitTime t0;
  private final SplitTime now = new SplitTime();
  private final EarthOrientation orientation;
  private final Cunningham geopotential;
  private final ThirdBodies thirdBodies;
  private final double shadowRadiusM;
  private final double gmFirst;
  private final double gmSecond;
  private final double[] rB = new double[3];
  private final double[] aB = new double[3];
  private final double[] aI = new double[3];
  private final double[] sun = new double[3];
  private final double[] second = new double[3];
  private final double[] pole = new double[3];

  ForceModel(ReferenceConfig cfg, SplitTime t0) {
    this.cfg = cfg;
    this.body = cfg.body();
    this.earth = body.centre() == CentralBody.CENTRE_EARTH;
    this.t0 = SplitTime.of(t0.wholeSeconds(), t0.fractionS());
    this.orientation = new EarthOrientation(MathMode.STRICT, body.rotationRateRadPerS());
    this.geopotential = earth ? new Cunningham(cfg.field(), cfg.degree()) : null;
    this.thirdBodies = cfg.thirdBodies();
    this.shadowRadiusM = earth ? 6_378_137.0 : 1_737_400.0;
    this.gmFirst = GM_SUN;
    this.gmSecond = earth ? GM_MOON : CentralBody.EARTH.gmM3PerS2();
    pole[2] = 1.0;
  }

  /**
   * Acceleration and clock rate at t seconds after t0.
   *
   * @param t seconds since t0 (TT)
   * @param r inertial position, m
   * @param v inertial velocity, m/s
   * @param aOut receives the acceleration, m/s^2
   * @return the clock rate breakdown
   */
  RateBreakdown evaluate(double t, double[] r, double[] v, double[] aOut) {
    now.setTo(t0);
    Instants.shift(now, t);
    final double tJ2000 = now.toSecondsApprox();
    final double r2 = r[0] * r[0] + r[1] * r[1] + r[2] * r[2];
    final double rn = Math.sqrt(r2);
    final double gm = body.gmM3PerS2();
    double uh;
    if (earth) {
      orientation.update(now, cfg.ut1MinusTtS());
      orientation.positionToItrs(r, rB);
      uh = geopotential.evaluate(rB, aB);
      orientation.positionToGcrs(aB, aI);
      orientation.poleInGcrs(pole);
    } else {
      if (thirdBodies != null) {
        thirdBodies.lunarPole(tJ2000, pole);
      }
      uh = j2(gm, r, rn, aI);
    }
    aOut[0] = aI[0];
    aOut[1] = aI[1];
    aOut[2] = aI[2];
    double ut = 0.0;
    if (thirdBodies != null) {
      thirdBodies.sunGeocentricM(tJ2000, sun);
      if (earth) {
        thirdBodies.moonGeocentricM(tJ2000, second);
      } else {
        thirdBodies.moonGeocentricM(tJ2000, second);
        for (int i = 0; i < 3; i++) {
          sun[i] -= second[i];
          second[i] = -second[i];
        }
      }
      ut = thirdBody(gmFirst, sun, r, aOut) + thirdBody(gmSecond, second, r, aOut);
      if (cfg.srpCrAreaOverMassM2PerKg() > 0) {
        radiationPressure(r, rn, aOut);
      }
    }
    if (earth && cfg.dragCdAreaOverMassM2PerKg() > 0) {
      drag(r, v, aOut);
    }
    final double v2 = v[0] * v[0] + v[1] * v[1] + v[2] * v[2];
    final double u0 = gm / rn;
    final double l = body.scaleRateL();
    final double kin = -0.5 * v2 / C2;
    final double grav = l - u0 / C2;
    final double harm = -uh / C2;
    final double tid = -ut / C2;
    double higher = 0.0;
    if (cfg.c4()) {
      final double u = u0 + uh + ut;
      final double a2 = -(0.5 * v2 + u) / C2;
      final double a4 = (0.5 * u * u - 1.5 * u * v2 - 0.125 * v2 * v2) / (C2 * C2);
      higher = (a4 + l * (a2 + l)) / (1.0 - l);
    }
    return new RateBreakdown(kin, grav, harm, tid, higher, kin + grav + harm + tid + higher);
  }

  /** Monopole plus J2 about the pole; returns U_J2. */
  private double j2(double gm, double[] r, double rn, double[] out) {
    final double rp = r[0] * pole[0] + r[1] * pole[1] + r[2] * pole[2];
    final double s2 = rp * rp / (rn * rn);
    final double rad = body.referenceRadiusM();
    final double r3 = rn * rn * rn;
    final double f = 1.5 * body.j2() * gm * rad * rad / (r3 * rn * rn);
    final double radial = -gm / r3 - f * (1.0 - 5.0 * s2);
    final double polar = -f * 2.0 * rp;
    for (int i = 0; i < 3; i++) {
      out[i] = radial * r[i] + polar * pole[i];
    }
    return -gm / rn * body.j2() * rad * rad / (rn * rn) * (1.5 * s2 - 0.5);
  }

  /** Adds a third body's indirect acceleration; returns its tidal potential at r. */
  private static double thirdBody(double gmB, double[] s, double[] r, double[] aOut) {
    final double dx = s[0] - r[0];
    final double dy = s[1] - r[1];
    final double dz = s[2] - r[2];
    final double d2 = dx * dx + dy * dy + dz * dz;
    final double d = Math.sqrt(d2);
    final double d3 = d2 * d;
    final double s2 = s[0] * s[0] + s[1] * s[1] + s[2] * s[2];
    final double sn = Math.sqrt(s2);
    final double s3 = s2 * sn;
    aOut[0] += gmB * (dx / d3 - s[0] / s3);
    aOut[1] += gmB * (dy / d3 - s[1] / s3);
    aOut[2] += gmB * (dz / d3 - s[2] / s3);
    final double sr = s[0] * r[0] + s[1] * r[1] + s[2] * r[2];
    return gmB * (1.0 / d - 1.0 / sn - sr / s3);
  }

  private void radiationPressure(double[] r, double rn, double[] aOut) {
    final double dx = r[0] - sun[0];
    final double dy = r[1] - sun[1];
    final double dz = r[2] - sun[2];
    final double d = Math.sqrt(dx * dx + dy * dy + dz * dz);
    final double nu = shadowFraction(r, rn, d);
    if (nu <= 0) {
      return;
    }
    final double k = nu * SOLAR_PRESSURE_N_PER_M2 * cfg.srpCrAreaOverMassM2PerKg() * (AU_M / d) * (AU_M / d) / d;
    aOut[0] += k * dx;
    aOut[1] += k * dy;
    aOut[2] += k * dz;
  }

  /** Conical shadow: fraction of the solar disk visible (Montenbruck and Gill 2000, 3.4.2). */
  private double shadowFraction(double[] r, double rn, double dSun) {
    final double a = Math.asin(Math.min(1.0, SUN_RADIUS_M / dSun));
    final double b = Math.asin(Math.min(1.0, shadowRadiusM / rn));
    final double dot = -(r[0] * (sun[0] - r[0]) + r[1] * (sun[1] - r[1]) + r[2] * (sun[2] - r[2]));
    final double c = Math.acos(Math.max(-1.0, Math.min(1.0, dot / (rn * dSun))));
    if (c >= a + b) {
      return 1.0;
    }
    if (c < b - a) {
      return 0.0;
    }
    if (c < a - b) {
      return 1.0 - (b * b) / (a * a);
    }
    final double x = (c * c + a * a - b * b) / (2.0 * c);
    final double y = Math.sqrt(Math.max(0.0, a * a - x * x));
    final double area = a * a * Math.acos(Math.max(-1.0, Math.min(1.0, x / a)))
        + b * b * Math.acos(Math.max(-1.0, Math.min(1.0, (c - x) / b))) - c * y;
    return 1.0 - area / (Math.PI * a * a);
  }

  private void drag(double[] r, double[] v, double[] aOut) {
    final double omega = body.rotationRateRadPerS();
    final double vrx = v[0] - omega * (pole[1] * r[2] - pole[2] * r[1]);
    final double vry = v[1] - omega * (pole[2] * r[0] - pole[0] * r[2]);
    final double vrz = v[2] - omega * (pole[0] * r[1] - pole[1] * r[0]);
    final double vr = Math.sqrt(vrx * vrx + vry * vry + vrz * vrz);
    final double rho = ExponentialAtmosphere.density(geodeticAltitude());
    final double k = -0.5 * cfg.dragCdAreaOverMassM2PerKg() * rho * vr;
    aOut[0] += k * vrx;
    aOut[1] += k * vry;
    aOut[2] += k * vrz;
  }

  /** Altitude above the WGS 84 ellipsoid, to first order in the flattening (error below 20 m). */
  private double geodeticAltitude() {
    final double rn = Math.sqrt(rB[0] * rB[0] + rB[1] * rB[1] + rB[2] * rB[2]);
    final double sinLat = rB[2] / rn;
    final double f = 1.0 / 298.257223563;
    return rn - 6_378_137.0 * (1.0 - f * sinLat * sinLat);
  }
}
