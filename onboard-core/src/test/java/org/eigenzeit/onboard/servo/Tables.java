package org.eigenzeit.onboard.servo;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;

/** Test helper: an active servo table from values. */
public final class Tables {
  private Tables() {}

  /**
   * An active table holding the values.
   *
   * @param values {@link ServoParameters#FIELD_COUNT} values
   * @return the active table
   */
  public static ServoParameters active(double[] values) {
    final ServoParameters p = new ServoParameters();
    final org.eigenzeit.onboard.table.UplinkTable u = new org.eigenzeit.onboard.table.UplinkTable(p);
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    if (ServoParameters.encode(values, b, 0) != Status.OK || u.load(b, 0, b.length) != Status.OK
        || u.activate() != Status.OK) {
      throw new IllegalStateException("table refused");
    }
    return p;
  }
}
