package org.eigenzeit.ground.scenario;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.UplinkTable;

/** The onboard core's own check of a servo table image, run when the scenario is read. */
final class ServoCheck {
  private ServoCheck() {}

  /**
   * Stages a table image in a scratch uplink table (CRC, then the core's content rules).
   *
   * @param image the encoded table
   * @return -1 when the core accepts it, else the refused field ({@link ServoParameters#FIELD_COUNT}
   *     for a consistency rule)
   */
  static int refusedField(byte[] image) {
    final UplinkTable t = new UplinkTable(new ServoParameters());
    return t.load(image, 0, image.length) == Status.OK ? -1
        : (t.lastFailedItem() >= 0 ? t.lastFailedItem() : ServoParameters.FIELD_COUNT);
  }
}
