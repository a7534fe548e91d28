package org.eigenzeit.onboard.table;

import org.eigenzeit.onboard.status.Status;

/**
 * Caller-owned housekeeping snapshot of one uplink table, filled by {@link UplinkTable#status}
 * without allocating. Mutable; one owner.
 */
public final class TableStatus {
  boolean active;
  boolean staged;
  int activeCrc;
  int loads;
  int crcFailures;
  int rangeFailures;
  int formatFailures;
  int activations;
  int lastLoadStatus = Status.NOT_READY;
  int lastFailedItem = -1;

  /** Creates an empty snapshot. */
  public TableStatus() {
    // empty
  }

  /**
   * Returns whether a table is active.
   *
   * @return whether a table is active
   */
  public boolean active() {
    return active;
  }

  /**
   * Returns whether a validated table waits for activation.
   *
   * @return whether one is staged
   */
  public boolean staged() {
    return staged;
  }

  /**
   * Returns the CRC-32C of the active table's image (0 when none).
   *
   * @return the CRC as a 32-bit word
   */
  public int activeCrc() {
    return activeCrc;
  }

  /**
   * Returns the loads attempted.
   *
   * @return the count
   */
  public int loads() {
    return loads;
  }

  /**
   * Returns the loads refused for their CRC.
   *
   * @return the count
   */
  public int crcFailures() {
    return crcFailures;
  }

  /**
   * Returns the loads refused for their content (a value not finite or out of range).
   *
   * @return the count
   */
  public int rangeFailures() {
    return rangeFailures;
  }

  /**
   * Returns the loads refused for their frame (bounds, length, magic, version, count).
   *
   * @return the count
   */
  public int formatFailures() {
    return formatFailures;
  }

  /**
   * Returns the activations.
   *
   * @return the count
   */
  public int activations() {
    return activations;
  }

  /**
   * Returns the status of the last load.
   *
   * @return the status code
   */
  public int lastLoadStatus() {
    return lastLoadStatus;
  }

  /**
   * Returns the item the last load's content check refused, or -1.
   *
   * @return the item
   */
  public int lastFailedItem() {
    return lastFailedItem;
  }
}
