package org.eigenzeit.ground.scenario;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;

/** The onboard core's own check of a servo table image, run when the scenario is read. */
final class ServoCheck {
  private ServoCheck() {}

  /**
   * Loads a table image into a scratch table holder.
   *
   * @param image the encoded table
   * @return -1 when the core accepts it, else the refused field ({@link ServoParameters#FIELD_COUNT}
   *     for a consistency rule)
   */
  static int refusedField(byte[] image) {
    final ServoParameters p = new ServoParameters();
    return p.load(image, 0, image.length) == Status.OK ? -1 : (p.lastFailedField() >= 0 ? p.lastFailedField() : ServoParameters.FIELD_COUNT);
  }
}
