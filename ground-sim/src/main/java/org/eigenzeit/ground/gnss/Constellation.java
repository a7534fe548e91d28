package org.eigenzeit.ground.gnss;

import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.onboard.relativity.ClosedForms;

/**
 * The satellite systems whose files Eigenzeit reads, with the constants their interface
 * specifications fix for the broadcast user algorithms.
 *
 * <table>
 *   <caption>broadcast constants</caption>
 *   <tr><th>system</th><th>mu, m^3/s^2</th><th>Earth rotation, rad/s</th><th>source</th></tr>
 *   <tr><td>GPS</td><td>3.986005e14</td><td>7.2921151467e-5</td><td>IS-GPS-200, Table 20-IV</td></tr>
 *   <tr><td>QZSS</td><td>3.986005e14</td><td>7.2921151467e-5</td><td>IS-QZSS (the GPS values; from memory)</td></tr>
 *   <tr><td>Galileo</td><td>3.986004418e14</td><td>7.2921151467e-5</td><td>Galileo OS SIS ICD issue 1.2 (2015), section 5.1.1</td></tr>
 *   <tr><td>GLONASS</td><td>3.986004418e14</td><td>7.292115e-5</td><td>GLONASS ICD edition 5.1 (2008), PZ-90.02 (from memory)</td></tr>
 * </table>
 *
 * <p>The relativistic constant is F = -2 sqrt(mu)/c^2 for each system's own mu (IS-GPS-200
 * section 20.3.3.3.3.1; Galileo OS SIS ICD section 5.1.4): -4.442807633e-10 s/sqrt(m) for GPS and
 * QZSS, -4.442807309e-10 s/sqrt(m) for Galileo. GLONASS broadcasts state vectors, not Keplerian
 * elements, and has no F.
 */
public enum Constellation {
  /** GPS. */
  GPS('G', 3.986005e14, 7.2921151467e-5),
  /** GLONASS. */
  GLONASS('R', 3.986004418e14, 7.292115e-5),
  /** Galileo. */
  GALILEO('E', 3.986004418e14, 7.2921151467e-5),
  /** QZSS. */
  QZSS('J', 3.986005e14, 7.2921151467e-5),
  /** BeiDou (precise orbits only: no BeiDou navigation reader). */
  BEIDOU('C', 3.986004418e14, 7.292115e-5);

  private final char letter;
  private final double mu;
  private final double omegaE;

  Constellation(char letter, double mu, double omegaE) {
    this.letter = letter;
    this.mu = mu;
    this.omegaE = omegaE;
  }

  /** @return the system letter of SP3 and RINEX 3 identifiers (G, R, E, J, C) */
  public char letter() {
    return letter;
  }

  /** @return the gravitational parameter of the broadcast user algorithm, m^3/s^2 */
  public double mu() {
    return mu;
  }

  /** @return the Earth rotation rate of the broadcast user algorithm, rad/s */
  public double earthRotationRadPerS() {
    return omegaE;
  }

  /** @return F = -2 sqrt(mu)/c^2, s/sqrt(m) */
  public double relativisticConstantF() {
    return ClosedForms.gpsConstantF(mu);
  }

  /**
   * The system of an identifier letter.
   *
   * @param c the letter
   * @param source file name for messages
   * @param line line for messages
   * @return the system
   * @throws InputException for an unknown letter
   */
  public static Constellation of(char c, String source, int line) {
    for (Constellation s : values()) {
      if (s.letter == c) {
        return s;
      }
    }
    throw new InputException(source, line, "satellite system letter: not supported, found '" + c
        + "', allowed G, R, E, J, C");
  }

  /**
   * A satellite identifier in SP3 form: system letter and two-digit number ("G05", "J01").
   *
   * @param number satellite number (PRN, GLONASS slot, QZSS PRN - 192)
   * @return the identifier
   */
  public String id(int number) {
    return letter + (number < 10 ? "0" : "") + number;
  }
}
