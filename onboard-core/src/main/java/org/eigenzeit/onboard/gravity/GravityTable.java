package org.eigenzeit.onboard.gravity;

import java.util.Arrays;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableImage;
import org.eigenzeit.onboard.table.TableLayout;

/**
 * The geopotential coefficients on board, as an uplink table: the staged and the active field of
 * a capacity fixed at construction, which the {@link Geopotential} evaluates. A new field takes
 * effect only when its image has been loaded, validated and explicitly activated through the
 * corrector's uplink table for it.
 *
 * <p>Image (the frame of {@link TableLayout}): magic {@code 0x455A4746} ("EZGF"), version 1, count
 * = degree N (2 to the capacity), then GM (m^3/s^2) and the reference radius (m) as doubles, then
 * for n = 2..N and m = 0..n the pair C_nm, S_nm (fully normalised), then the CRC-32C. Content
 * rules: GM and radius finite and within 1 % of the reference body's (item 0 and 1: a field for
 * another body is refused); every coefficient finite, |value| at most {@value
 * GravityField#MAX_ABS_COEFFICIENT}, S_n0 zero (item: the packed index n(n+1)/2 + m).
 *
 * <p>Mutable; one owner. No allocation after construction.
 */
public final class GravityTable implements TableLayout {
  /** Magic number "EZGF". */
  public static final int MAGIC = 0x455A4746;
  /** Layout version. */
  public static final int VERSION = 1;
  /** Largest relative departure of GM and radius from the reference body's. */
  public static final double BODY_TOLERANCE = 0.01;

  private final int capacityDegree;
  private final double referenceGm;
  private final double referenceRadius;
  private final double[] activeC;
  private final double[] activeS;
  private final double[] stagedC;
  private final double[] stagedS;
  private int activeDegree;
  private double activeGm;
  private double activeRadius;
  private int stagedDegree;
  private double stagedGm;
  private double stagedRadius;
  private int failedItem = -1;

  /**
   * Creates an empty table (nothing active).
   *
   * @param capacityDegree largest degree it can hold (0: the configuration evaluates no
   *     harmonics, every image is refused; else 2 to {@value GravityField#MAX_CAPACITY_DEGREE})
   * @param referenceGm GM of the body the fields must belong to, m^3/s^2
   * @param referenceRadius its reference radius, m
   * @throws IllegalArgumentException when the capacity is out of range
   */
  public GravityTable(int capacityDegree, double referenceGm, double referenceRadius) {
    if (capacityDegree != 0 && (capacityDegree < 2 || capacityDegree > GravityField.MAX_CAPACITY_DEGREE)) {
      throw new IllegalArgumentException("capacity degree must be 0 or 2.." + GravityField.MAX_CAPACITY_DEGREE);
    }
    this.capacityDegree = capacityDegree;
    this.referenceGm = referenceGm;
    this.referenceRadius = referenceRadius;
    final int n = capacityDegree == 0 ? 0 : GravityField.index(capacityDegree, capacityDegree) + 1;
    activeC = new double[n];
    activeS = new double[n];
    stagedC = new double[n];
    stagedS = new double[n];
  }

  /**
   * A table of a field's own degree with the field active (construction time: ground tools,
   * tests, a tracker built alone).
   *
   * @param field the field
   * @return the table
   */
  public static GravityTable of(GravityField field) {
    final GravityTable t = new GravityTable(field.degree(), field.gmM3PerS2(), field.radiusM());
    t.install(field);
    return t;
  }

  /**
   * Makes a field active directly, without an uplink (construction time only).
   *
   * @param field the field (degree within the capacity)
   * @throws IllegalArgumentException when the field does not fit
   */
  public void install(GravityField field) {
    if (field.degree() > capacityDegree) {
      throw new IllegalArgumentException("field degree " + field.degree() + " above the capacity " + capacityDegree);
    }
    stagedDegree = field.degree();
    stagedGm = field.gmM3PerS2();
    stagedRadius = field.radiusM();
    Arrays.fill(stagedC, 0.0);
    Arrays.fill(stagedS, 0.0);
    for (int n = 2; n <= stagedDegree; n++) {
      for (int m = 0; m <= n; m++) {
        stagedC[GravityField.index(n, m)] = field.c(n, m);
        stagedS[GravityField.index(n, m)] = field.s(n, m);
      }
    }
    activate();
  }

  /**
   * Length of the image of a field of degree N.
   *
   * @param degree N
   * @return bytes
   */
  public static int imageBytesFor(int degree) {
    return 8 + 16 + 16 * (GravityField.index(degree, degree) + 1 - 3) + 4;
  }

  /**
   * Encodes a field into its uplink image (ground side and tests).
   *
   * @param field the field
   * @param out buffer of at least {@link #imageBytesFor}(degree) bytes from {@code offset}
   * @param offset where to write
   * @return {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL}
   */
  @CheckReturnValue
  public static int encode(GravityField field, byte[] out, int offset) {
    final int bytes = imageBytesFor(field.degree());
    final StateWriter w = new StateWriter();
    final int st = TableImage.begin(out, offset, bytes, MAGIC, VERSION, field.degree(), w);
    if (st != Status.OK) {
      return st;
    }
    w.putDouble(field.gmM3PerS2());
    w.putDouble(field.radiusM());
    for (int n = 2; n <= field.degree(); n++) {
      for (int m = 0; m <= n; m++) {
        w.putDouble(field.c(n, m));
        w.putDouble(field.s(n, m));
      }
    }
    return TableImage.seal(out, offset, bytes, w);
  }

  @Override
  public int magic() {
    return MAGIC;
  }

  @Override
  public int version() {
    return VERSION;
  }

  @Override
  public int checkCount(int count) {
    if (count < 2) {
      return Status.MALFORMED;
    }
    return count > capacityDegree ? Status.CAPACITY_EXCEEDED : Status.OK;
  }

  @Override
  public int imageBytes(int count) {
    return imageBytesFor(count);
  }

  @Override
  public int stage(StateReader payload, int count) {
    failedItem = -1;
    final double gm = payload.getDouble();
    final double radius = payload.getDouble();
    if (!near(gm, referenceGm) || !near(radius, referenceRadius)) {
      failedItem = near(gm, referenceGm) ? 1 : 0;
      return Double.isFinite(gm) && Double.isFinite(radius) ? Status.OUT_OF_RANGE : Status.NOT_FINITE;
    }
    Arrays.fill(stagedC, 0.0);
    Arrays.fill(stagedS, 0.0);
    for (int n = 2; n <= count; n++) {
      for (int m = 0; m <= n; m++) {
        final double c = payload.getDouble();
        final double s = payload.getDouble();
        if (!(Math.abs(c) <= GravityField.MAX_ABS_COEFFICIENT) || !(Math.abs(s) <= GravityField.MAX_ABS_COEFFICIENT)
            || (m == 0 && s != 0.0)) {
          failedItem = GravityField.index(n, m);
          return Double.isFinite(c) && Double.isFinite(s) ? Status.OUT_OF_RANGE : Status.NOT_FINITE;
        }
        stagedC[GravityField.index(n, m)] = c;
        stagedS[GravityField.index(n, m)] = s;
      }
    }
    stagedDegree = count;
    stagedGm = gm;
    stagedRadius = radius;
    return Status.OK;
  }

  private static boolean near(double v, double reference) {
    return Math.abs(v - reference) <= BODY_TOLERANCE * reference;
  }

  @Override
  public int failedItem() {
    return failedItem;
  }

  @Override
  public void activate() {
    System.arraycopy(stagedC, 0, activeC, 0, activeC.length);
    System.arraycopy(stagedS, 0, activeS, 0, activeS.length);
    activeDegree = stagedDegree;
    activeGm = stagedGm;
    activeRadius = stagedRadius;
  }

  /**
   * Returns the largest degree this table can hold (0: none).
   *
   * @return the capacity
   */
  public int capacityDegree() {
    return capacityDegree;
  }

  /**
   * Returns the degree of the active field (0 when none is active).
   *
   * @return the degree
   */
  public int degree() {
    return activeDegree;
  }

  /**
   * Returns GM of the active field, m^3/s^2.
   *
   * @return GM
   */
  public double gmM3PerS2() {
    return activeGm;
  }

  /**
   * Returns the reference radius of the active field, m.
   *
   * @return the radius
   */
  public double radiusM() {
    return activeRadius;
  }

  /** Active C by packed index (no checks; for the evaluator's inner loop). */
  double cPacked(int i) {
    return activeC[i];
  }

  /** Active S by packed index (no checks; for the evaluator's inner loop). */
  double sPacked(int i) {
    return activeS[i];
  }
}
