package org.eigenzeit.ground.uplink;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.LocalDateTime;
import java.time.format.DateTimeParseException;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.zip.CRC32C;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.gravity.GravityTable;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableLayout;
import org.eigenzeit.onboard.table.UplinkTable;
import org.eigenzeit.onboard.time.LeapSecondTable;

/**
 * A table specification in YAML, turned into the onboard core's binary uplink image after the
 * core's own content rules accepted it. One document, one mapping, no duplicate or unknown key:
 *
 * <pre>
 *   table: servo                 servo | gravity | leap-seconds | lunar-time
 *   # servo: every field of ServoParameters by name under 'fields', or 'base: typical-rubidium'
 *   #        and only the fields that differ (the command line also takes a campaign scenario's
 *   #        servo table)
 *   # gravity: 'coefficients: FILE' (n m C S lines) or 'shipped-egm96', 'degree: N', and for a
 *   #        file 'gm_m3_per_s2' and 'radius_m' (the shipped EGM96 brings its own)
 *   # leap-seconds: 'list: FILE' (the IERS/NIST leap-seconds.list)
 *   # lunar-time: 'start_tt: YYYY-MM-DDThh:mm:ss' (TT), 'span_days: D' (1/24 to 64), optional
 *   #        'target_ps' (fit target, 0.1 to 1000, default 1), 'table_id' (0 to 2^31 - 1, default
 *   #        1) and 'lunar_l' (L_L of TL, default Eigenzeit's GM_M/(R_M c^2)): the TL - TT
 *   #        relation fitted along DE405 (LunarTableFitter), framed as TableId.LUNAR_TIME
 * </pre>
 *
 * File names resolve against the specification's folder. Every refusal names the file and the key
 * (or the referenced file and its line), what is wrong, what was found and what is allowed.
 */
public final class TableSpec {
  /**
   * A written image.
   *
   * @param tableId the core's table identifier
   * @param bytes the framed image
   * @param crc its CRC-32C
   * @param detail what the operator should read beside it (the lunar table's fit), or empty
   */
  public record Image(int tableId, byte[] bytes, int crc, String detail) {
    /** Copies the image so that the record is immutable. */
    public Image {
      bytes = bytes.clone();
    }

    /**
     * An image without detail.
     *
     * @param tableId the core's table identifier
     * @param bytes the framed image
     * @param crc its CRC-32C
     */
    public Image(int tableId, byte[] bytes, int crc) {
      this(tableId, bytes, crc, "");
    }

    @Override
    public byte[] bytes() {
      return bytes.clone();
    }
  }

  private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory())
      .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);

  private final String file;
  private final Path dir;
  private final JsonNode root;
  private final LunarFit lunarFit;

  private TableSpec(String file, Path dir, JsonNode root, LunarFit lunarFit) {
    this.file = file;
    this.dir = dir;
    this.root = root;
    this.lunarFit = lunarFit;
  }

  /**
   * Reads a specification and builds its image.
   *
   * @param path the YAML file
   * @return the image
   * @throws UplinkInputException at the first refusal
   * @throws IOException when a file cannot be read
   */
  public static Image read(Path path) throws IOException {
    return read(path, null);
  }

  /**
   * Reads a specification and builds its image, lunar time tables included.
   *
   * @param path the YAML file
   * @param lunarFit fits a lunar time table (null: the lunar-time table is refused)
   * @return the image
   * @throws UplinkInputException at the first refusal
   * @throws IOException when a file cannot be read
   */
  public static Image read(Path path, LunarFit lunarFit) throws IOException {
    final String file = String.valueOf(path);
    final JsonNode root;
    try (MappingIterator<JsonNode> docs = YAML.readerFor(JsonNode.class).readValues(Files.newInputStream(path))) {
      final List<JsonNode> all = docs.readAll();
      if (all.size() != 1) {
        throw new UplinkInputException(file + ": " + all.size() + " YAML documents, allowed exactly one");
      }
      root = all.get(0);
    } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
      throw new UplinkInputException(file + ":" + e.getLocation().getLineNr() + ": not valid YAML: "
          + e.getOriginalMessage());
    }
    if (root == null || !root.isObject()) {
      throw new UplinkInputException(file + ": the specification must be a YAML mapping");
    }
    final Path dir = path.toAbsolutePath().getParent();
    return new TableSpec(file, dir == null ? Path.of(".") : dir, root, lunarFit).build();
  }

  private Image build() throws IOException {
    final String table = text("table");
    switch (table) {
      case "servo" -> {
        return servo();
      }
      case "gravity" -> {
        return gravity();
      }
      case "leap-seconds" -> {
        known("table", "list");
        final Path list = dir.resolve(text("list"));
        return checked(TableId.LEAP_SECONDS, new LeapSecondTable(),
            LeapSecondsList.read(String.valueOf(list), Files.readAllBytes(list)).image());
      }
      case "lunar-time" -> {
        return lunar();
      }
      default -> throw error("table", "'" + table + "'", "servo, gravity, leap-seconds or lunar-time");
    }
  }

  private Image servo() {
    known("table", "base", "fields");
    final boolean base = root.has("base");
    if (base && !"typical-rubidium".equals(text("base"))) {
      throw error("base", "'" + text("base") + "'", "typical-rubidium");
    }
    final double[] values = base ? ServoParameters.typicalRubidium() : new double[ServoParameters.FIELD_COUNT];
    final JsonNode fields = root.get("fields");
    if (fields != null && !fields.isObject()) {
      throw error("fields", fields.getNodeType().toString().toLowerCase(Locale.ROOT), "a mapping of field: value");
    }
    for (int i = 0; i < ServoParameters.FIELD_COUNT; i++) {
      final String name = ServoParameters.fieldName(i);
      if (fields != null && fields.has(name)) {
        values[i] = number("fields." + name, fields.get(name));
      } else if (!base) {
        throw error("fields." + name, "nothing", "a value (or 'base: typical-rubidium' for the ones not given)");
      }
    }
    for (Iterator<String> it = fields == null ? List.<String>of().iterator() : fields.fieldNames(); it.hasNext(); ) {
      final String k = it.next();
      if (indexOf(k) < 0) {
        throw error("fields." + k, "an unknown field", "the names in docs/cli.md");
      }
    }
    return servoImage(file, values);
  }

  /**
   * The servo image of a set of values, after the core's content rules accepted them.
   *
   * @param source file name for messages (a specification or a scenario)
   * @param values {@link ServoParameters#FIELD_COUNT} values
   * @return the image
   * @throws UplinkInputException naming the refused field, its value and its range
   */
  public static Image servoImage(String source, double[] values) {
    final byte[] image = new byte[ServoParameters.TABLE_BYTES];
    if (ServoParameters.encode(values, image, 0) != Status.OK) {
      throw new IllegalStateException("servo image encoding failed");
    }
    final UplinkTable t = new UplinkTable(new ServoParameters());
    if (t.load(image, 0, image.length) != Status.OK) {
      final int item = t.lastFailedItem();
      if (item == ServoParameters.FIELD_COUNT) {
        throw new UplinkInputException(source + ": key 'fields': found thresholds that contradict each other, allowed "
            + "track_exit_s > track_enter_s, coast_max_s >= coast_after_s, time_constant_track_s >= "
            + "time_constant_acquire_s");
      }
      throw new UplinkInputException(source + ": key 'fields." + ServoParameters.fieldName(item) + "': found "
          + values[item] + ", allowed " + ServoParameters.min(item) + " .. " + ServoParameters.max(item));
    }
    return new Image(TableId.SERVO, image, crc(image));
  }

  private static int indexOf(String name) {
    for (int i = 0; i < ServoParameters.FIELD_COUNT; i++) {
      if (ServoParameters.fieldName(i).equals(name)) {
        return i;
      }
    }
    return -1;
  }

  private Image gravity() throws IOException {
    known("table", "coefficients", "degree", "gm_m3_per_s2", "radius_m");
    final int degree = integer("degree", 2, GravityField.MAX_CAPACITY_DEGREE);
    final String source = text("coefficients");
    final GravityField field;
    if ("shipped-egm96".equals(source)) {
      if (degree > 36 || root.has("gm_m3_per_s2") || root.has("radius_m")) {
        throw error("coefficients", "shipped-egm96 with degree " + degree + " or its own GM/radius",
            "degree up to 36, GM and radius from EGM96");
      }
      field = GravityField.egm96(degree);
    } else {
      final Path f = dir.resolve(source);
      field = CoefficientFile.read(String.valueOf(f), Files.readAllBytes(f), number("gm_m3_per_s2", root.get(
          "gm_m3_per_s2")), number("radius_m", root.get("radius_m")), degree);
    }
    final CentralBody earth = CentralBody.EARTH;
    final byte[] image = new byte[GravityTable.imageBytesFor(degree)];
    if (GravityTable.encode(field, image, 0) != Status.OK) {
      throw new IllegalStateException("gravity image encoding failed");
    }
    final GravityTable layout = new GravityTable(degree, earth.gmM3PerS2(), earth.referenceRadiusM());
    final UplinkTable t = new UplinkTable(layout);
    if (t.load(image, 0, image.length) != Status.OK) {
      throw error(t.lastFailedItem() == 0 ? "gm_m3_per_s2" : "radius_m", t.lastFailedItem() == 0
          ? String.valueOf(field.gmM3PerS2()) : String.valueOf(field.radiusM()), "within 1 % of the Earth's "
          + "(the onboard gravity table holds the central body's field; harmonics are Earth-only)");
    }
    return new Image(TableId.GRAVITY, image, crc(image));
  }

  /**
   * Fits and frames the lunar time table of a span; supplied by the caller, because the fit needs
   * the time-scale relations along DE405, which live above this package.
   */
  @FunctionalInterface
  public interface LunarFit {
    /**
     * The table of a span.
     *
     * @param startTtS span start, TT whole seconds since J2000.0
     * @param spanS span length, s
     * @param targetS fit target, s
     * @param tableId the table's identifier
     * @param lunarL L_L of TL
     * @return the framed image (TableId.LUNAR_TIME) and a one-line description of the fit
     * @throws IllegalArgumentException when no table can be fitted for the span
     */
    Framed fit(long startTtS, long spanS, double targetS, long tableId, double lunarL);
  }

  /**
   * A framed image and what the operator should read beside it.
   *
   * @param bytes the framed image
   * @param detail one line
   */
  public record Framed(byte[] bytes, String detail) {
    /** Copies the image. */
    public Framed {
      bytes = bytes.clone();
    }

    @Override
    public byte[] bytes() {
      return bytes.clone();
    }
  }

  private Image lunar() {
    known("table", "start_tt", "span_days", "target_ps", "table_id", "lunar_l");
    if (lunarFit == null) {
      throw error("table", "'lunar-time'", "servo, gravity or leap-seconds here (the lunar table is fitted by the "
          + "command line's table-image, which has the time-scale relations)");
    }
    final String startText = text("start_tt");
    final LocalDateTime start;
    try {
      start = LocalDateTime.parse(startText); // ISO, strict: month 13, day 45, hour 25, second 60 refused
    } catch (DateTimeParseException e) {
      throw error("start_tt", "'" + startText + "'", "YYYY-MM-DDThh:mm:ss, a real instant of TT in whole seconds");
    }
    if (start.getNano() != 0) {
      throw error("start_tt", "'" + startText + "'", "whole seconds of TT");
    }
    // TT has no leap seconds: its labels count SI seconds from 2000-01-01T12:00:00 TT (J2000.0).
    final long startTtS = Duration.between(LocalDateTime.of(2000, 1, 1, 12, 0), start).getSeconds();
    final double spanDays = root.has("span_days") ? number("span_days", root.get("span_days")) : Double.NaN;
    if (!(spanDays >= 1.0 / 24 && spanDays <= 64)) {
      throw error("span_days", root.has("span_days") ? root.get("span_days").toString() : "nothing",
          "a number of days 1/24 .. 64 (one uplink span)");
    }
    final double targetPs = root.has("target_ps") ? number("target_ps", root.get("target_ps")) : 1.0;
    if (!(targetPs >= 0.1 && targetPs <= 1000)) {
      throw error("target_ps", root.get("target_ps").toString(), "0.1 .. 1000 ps (the fitter's floor is 0.1 ps)");
    }
    final long id = root.has("table_id") ? integer("table_id", 0, Integer.MAX_VALUE) : 1;
    final double l = root.has("lunar_l") ? number("lunar_l", root.get("lunar_l")) : CentralBody.MOON.scaleRateL();
    if (!(l > 0 && l < 1e-9)) {
      throw error("lunar_l", root.get("lunar_l").toString(), "above 0 and below 1e-9");
    }
    final Framed framed;
    try {
      framed = lunarFit.fit(startTtS, Math.round(spanDays * 86_400.0), targetPs * 1e-12, id, l);
    } catch (IllegalArgumentException e) {
      throw error("start_tt", "'" + startText + "' with span_days " + spanDays + " (" + e.getMessage() + ")",
          "a span inside DE405 (TDB 1999-12-24 to 2040-01-25)");
    }
    final Image image = checked(TableId.LUNAR_TIME, new org.eigenzeit.onboard.lunartime.LunarTimeLayout(), framed.bytes());
    return new Image(image.tableId(), image.bytes(), image.crc(), framed.detail());
  }

  private Image checked(int id, TableLayout layout, byte[] image) {
    if (new UplinkTable(layout).load(image, 0, image.length) != Status.OK) {
      throw new IllegalStateException("an image the decoder accepted was refused by the core (a defect)");
    }
    return new Image(id, image, crc(image));
  }

  private static int crc(byte[] image) {
    final CRC32C c = new CRC32C();
    c.update(image, 0, image.length - 4);
    return (int) c.getValue();
  }

  private UplinkInputException error(String key, String found, String allowed) {
    return new UplinkInputException(file + ": key '" + key + "': found " + found + ", allowed " + allowed);
  }

  private void known(String... keys) {
    final Set<String> allowed = Set.of(keys);
    for (Iterator<String> it = root.fieldNames(); it.hasNext(); ) {
      final String k = it.next();
      if (!allowed.contains(k)) {
        throw error(k, "an unknown key", "one of " + String.join(", ", keys));
      }
    }
  }

  private String text(String key) {
    final JsonNode n = root.get(key);
    if (n == null || !n.isTextual() || n.asText().isBlank()) {
      throw error(key, n == null ? "nothing" : n.toString(), "a text value");
    }
    return n.asText();
  }

  private double number(String key, JsonNode n) {
    final double v;
    if (n != null && n.isNumber()) {
      v = n.doubleValue();
    } else if (n != null && n.isTextual() && n.asText().trim().matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d{1,3})?")) {
      v = Double.parseDouble(n.asText().trim());
    } else {
      throw error(key, n == null ? "nothing" : n.toString(), "a finite decimal number");
    }
    if (!Double.isFinite(v)) {
      throw error(key, n.toString(), "a finite decimal number");
    }
    return v;
  }

  private int integer(String key, int min, int max) {
    final JsonNode n = root.get(key);
    final double v = number(key, n);
    if (Double.compare(v, Math.rint(v)) != 0 || v < min || v > max) { // a fraction is refused, not cut
      throw error(key, n.toString(), "a whole number " + min + " .. " + max);
    }
    return (int) v;
  }
}
