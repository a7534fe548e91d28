package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.gravity.GravityTable;
import org.eigenzeit.onboard.lunartime.LunarTimeLayout;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.RateModel;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableLayout;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.table.UplinkTable;
import org.eigenzeit.onboard.time.LeapSecondTable;

/**
 * Every uplink table a corrector owns, by {@link TableId}, each behind the one {@link UplinkTable}
 * mechanism: the servo parameters (nothing active until the first upload), the geopotential
 * coefficients (the configuration's field is loaded and activated at construction as the first
 * image, so its CRC is reported like any other; none at levels below HARMONICS), the leap
 * seconds and, for a Moon-centred configuration only, the lunar time table (nothing active until
 * the first upload of either; an Earth-centred corrector refuses the lunar table's identifier). A new table type is added here with its layout.
 *
 * <p>Mutable; one owner. Allocates only at construction.
 */
final class TableSet {
  private final ServoParameters servo = new ServoParameters();
  private final GravityTable gravity;
  private final LeapSecondTable leapSeconds = new LeapSecondTable();
  private final LunarTimeLayout lunarTime;
  private final UplinkTable[] tables = new UplinkTable[TableId.COUNT];

  TableSet(ModelConfig config) {
    gravity = RateModel.emptyGravityTable(config);
    register(TableId.SERVO, servo);
    register(TableId.GRAVITY, gravity);
    register(TableId.LEAP_SECONDS, leapSeconds);
    // the lunar table's buffers (about 26 kB) only where it is used: a Moon-centred configuration
    lunarTime = config.body().centre() == org.eigenzeit.onboard.body.CentralBody.CENTRE_MOON ? new LunarTimeLayout()
        : null;
    if (lunarTime != null) {
      register(TableId.LUNAR_TIME, lunarTime);
    }
    final GravityField field = config.field();
    if (field != null) {
      final GravityField cut = field.truncated(config.degree());
      final byte[] image = new byte[GravityTable.imageBytesFor(cut.degree())];
      if (GravityTable.encode(cut, image, 0) != Status.OK
          || tables[TableId.GRAVITY].load(image, 0, image.length) != Status.OK
          || tables[TableId.GRAVITY].activate() != Status.OK) {
        throw new IllegalArgumentException("the configured gravity field is refused by its own table's rules");
      }
    }
  }

  private void register(int id, TableLayout layout) {
    tables[id] = new UplinkTable(layout);
  }

  /** The table of an identifier, or null when out of range or not held by this configuration. */
  UplinkTable table(int id) {
    return id >= 0 && id < TableId.COUNT ? tables[id] : null;
  }

  ServoParameters servo() {
    return servo;
  }

  GravityTable gravity() {
    return gravity;
  }

  LeapSecondTable leapSeconds() {
    return leapSeconds;
  }

  LunarTimeLayout lunarTime() {
    return lunarTime;
  }

  void status(TableStatus[] out) {
    for (int i = 0; i < TableId.COUNT; i++) {
      if (tables[i] != null) {
        tables[i].status(out[i]);
      }
    }
  }
}
