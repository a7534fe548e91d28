package org.eigenzeit.ground.gnss;

import java.util.Arrays;
import org.eigenzeit.ground.trajectory.BroadcastEphemeris;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.eigenzeit.onboard.relativity.ClosedForms;

/**
 * One Keplerian broadcast record of a RINEX 2 navigation file (GPS, Gurtner and Estey 2007 Table
 * A4; QZSS, RINEX 2.12 with the same 29 parameters), as written: the clock polynomial, the 16
 * orbit parameters, and the data words (IODE, IODC, health, accuracy, week, TGD, transmission
 * time, fit interval). Values are not judged here; {@link BroadcastCheck} does that.
 *
 * <p>The user algorithm is IS-GPS-200 section 20.3.3.4.3 (Table 20-IV), through
 * {@link BroadcastEphemeris}; QZSS uses it with the same constants (IS-QZSS). Immutable.
 */
public final class KeplerRecord {
  /** Indices into {@link #parameters()} (RINEX 2 order, clock first). */
  public static final int A0 = 0;
  /** Clock drift. */
  public static final int A1 = 1;
  /** Clock drift rate. */
  public static final int A2 = 2;
  /** IODE. */
  public static final int IODE = 3;
  /** Crs, m. */
  public static final int CRS = 4;
  /** Delta n, rad/s. */
  public static final int DELTA_N = 5;
  /** M0, rad. */
  public static final int M0 = 6;
  /** Cuc, rad. */
  public static final int CUC = 7;
  /** Eccentricity. */
  public static final int E = 8;
  /** Cus, rad. */
  public static final int CUS = 9;
  /** sqrt(A), sqrt(m). */
  public static final int SQRT_A = 10;
  /** toe, seconds of the week. */
  public static final int TOE = 11;
  /** Cic, rad. */
  public static final int CIC = 12;
  /** OMEGA0, rad. */
  public static final int OMEGA0 = 13;
  /** Cis, rad. */
  public static final int CIS = 14;
  /** i0, rad. */
  public static final int I0 = 15;
  /** Crc, m. */
  public static final int CRC = 16;
  /** omega, rad. */
  public static final int OMEGA = 17;
  /** OMEGA DOT, rad/s. */
  public static final int OMEGA_DOT = 18;
  /** IDOT, rad/s. */
  public static final int IDOT = 19;
  /** Codes on L2. */
  public static final int L2_CODES = 20;
  /** GPS week of toe (continuous). */
  public static final int WEEK = 21;
  /** L2 P data flag. */
  public static final int L2P = 22;
  /** SV accuracy, m. */
  public static final int ACCURACY = 23;
  /** SV health word. */
  public static final int HEALTH = 24;
  /** TGD, s. */
  public static final int TGD = 25;
  /** IODC. */
  public static final int IODC = 26;
  /** Transmission time, seconds of the week. */
  public static final int TRANSMISSION = 27;
  /** Fit interval, hours (0: not known). */
  public static final int FIT = 28;
  /** Number of parameters. */
  public static final int COUNT = 29;

  private final Constellation system;
  private final int number;
  private final String source;
  private final int line;
  private final double tocGpsS;
  private final double[] p;

  /**
   * Creates a record.
   *
   * @param system GPS or QZSS
   * @param number PRN (QZSS: PRN - 192)
   * @param source file name
   * @param line line of the record's first line
   * @param tocGpsS clock reference time, GPS seconds since the GPS epoch
   * @param parameters the 29 parameters in RINEX order
   */
  public KeplerRecord(Constellation system, int number, String source, int line, double tocGpsS, double[] parameters) {
    if (system != Constellation.GPS && system != Constellation.QZSS) {
      throw new IllegalArgumentException("Keplerian records of GPS and QZSS only, not " + system);
    }
    if (parameters.length != COUNT) {
      throw new IllegalArgumentException(COUNT + " parameters expected");
    }
    this.system = system;
    this.number = number;
    this.source = source;
    this.line = line;
    this.tocGpsS = tocGpsS;
    this.p = parameters.clone();
  }

  /** @return the system */
  public Constellation system() {
    return system;
  }

  /** @return satellite number */
  public int number() {
    return number;
  }

  /** @return identifier such as G05 or J01 */
  public String id() {
    return system.id(number);
  }

  /** @return file name */
  public String source() {
    return source;
  }

  /** @return line of the record's first line */
  public int line() {
    return line;
  }

  /** @return "file:line" of the record */
  public String where() {
    return source + ":" + line;
  }

  /** @return the clock reference time, GPS seconds since the GPS epoch */
  public double tocGpsS() {
    return tocGpsS;
  }

  /**
   * One parameter.
   *
   * @param index one of the index constants
   * @return the value as written
   */
  public double get(int index) {
    return p[index];
  }

  /** @return all 29 parameters, RINEX order */
  public double[] parameters() {
    return p.clone();
  }

  /** @return toe as GPS seconds since the GPS epoch (week of toe times 604800 plus toe) */
  public double toeGpsS() {
    return p[WEEK] * GnssTimeSystem.WEEK_S + p[TOE];
  }

  /** @return IODE */
  public int iode() {
    return (int) p[IODE];
  }

  /** @return IODC */
  public int iodc() {
    return (int) p[IODC];
  }

  /** @return the health word */
  public int health() {
    return (int) p[HEALTH];
  }

  /**
   * Whether another record carries the same data, field for field (clock, orbit, data words;
   * transmission time and fit interval aside, which differ between copies of one message).
   *
   * @param o the other record
   * @return true when equal
   */
  public boolean sameData(KeplerRecord o) {
    return Arrays.equals(Arrays.copyOf(p, TRANSMISSION), Arrays.copyOf(o.p, TRANSMISSION));
  }

  /**
   * Whether another record carries the same orbit (the 16 orbit parameters and toe, week).
   *
   * @param o the other record
   * @return true when equal
   */
  public boolean sameOrbit(KeplerRecord o) {
    return Arrays.equals(Arrays.copyOfRange(p, CRS, IDOT + 1), Arrays.copyOfRange(o.p, CRS, IDOT + 1))
        && Double.compare(p[WEEK], o.p[WEEK]) == 0;
  }

  /** @return the elements for the IS-GPS-200 user algorithm */
  public BroadcastEphemeris ephemeris() {
    return new BroadcastEphemeris(number, GnssTimeSystem.secondsOfWeek(tocGpsS), p[TOE], (int) p[WEEK], p[SQRT_A], p[E],
        p[M0], p[DELTA_N], p[OMEGA0], p[I0], p[OMEGA], p[OMEGA_DOT], p[IDOT], p[CUC], p[CUS], p[CRC], p[CRS], p[CIC],
        p[CIS], (int) p[HEALTH]);
  }

  /**
   * Time from toe, s.
   *
   * @param gpsS GPS seconds since the GPS epoch
   * @return t - toe
   */
  public double sinceToeS(double gpsS) {
    return gpsS - toeGpsS();
  }

  /**
   * The interface-specification term F e sqrt(A) sin E_k (IS-GPS-200 section 20.3.3.3.3.1), with
   * the system's own F.
   *
   * @param gpsS GPS seconds since the GPS epoch
   * @return the term, s
   */
  public double relativisticTermS(double gpsS) {
    final double ek = ephemeris().eccentricAnomaly(GnssTimeSystem.secondsOfWeek(gpsS));
    return ClosedForms.eccentricityTermS(system.relativisticConstantF(), p[E], p[SQRT_A], ek);
  }

  /**
   * Earth-fixed position and velocity of the broadcast orbit: position by the user algorithm,
   * velocity by its central difference over +-1 s (error below 1e-4 m/s for a 12 h orbit: the
   * third derivative of the position is about n^3 r = 8e-5 m/s^3, times h^2/6).
   *
   * @param gpsS GPS seconds since the GPS epoch
   * @param r receives the position, m
   * @param v receives the velocity, m/s
   */
  public void state(double gpsS, double[] r, double[] v) {
    final BroadcastEphemeris eph = ephemeris();
    final double sow = GnssTimeSystem.secondsOfWeek(gpsS);
    final double[] p0 = eph.positionEcef(sow);
    final double[] pm = eph.positionEcef(sow - 1.0);
    final double[] pp = eph.positionEcef(sow + 1.0);
    for (int c = 0; c < 3; c++) {
      r[c] = p0[c];
      v[c] = (pp[c] - pm[c]) / 2.0;
    }
  }

  /**
   * The bound of what F e sqrt(A) sin E_k omits against -2 r.v/c^2 of the same broadcast orbit.
   * With r = A(1 - e cos E) + dr and dr = Crs sin 2Phi + Crc cos 2Phi (IS-GPS-200 Table 20-IV),
   * r.v = r dr/dt = sqrt(mu A) e sin E + A^2 dn e sin E + dr A e n sin E/(1 - e cos E) + r d(dr)/dt,
   * so the omitted part is bounded by
   * (2/c^2)[A^2 |dn| e + C A e n/(1 - e) + r_max 2 Phidot_max C] with C = sqrt(Crs^2 + Crc^2),
   * r_max = A(1 + e) + C and Phidot_max = sqrt(1 - e^2) n/(1 - e)^2 (our derivation).
   *
   * @return the bound, s
   */
  public double formulaOmissionBoundS() {
    final double a = p[SQRT_A] * p[SQRT_A];
    final double e = p[E];
    final double n = Math.sqrt(system.mu() / (a * a * a)) + p[DELTA_N];
    final double c = Math.hypot(p[CRS], p[CRC]);
    final double phiDot = Math.sqrt(1 - e * e) * n / ((1 - e) * (1 - e));
    final double rMax = a * (1 + e) + c;
    return 2.0 / org.eigenzeit.onboard.body.CentralBody.C2
        * (a * a * Math.abs(p[DELTA_N]) * e + c * a * e * n / (1 - e) + rMax * 2 * phiDot * c);
  }
}
