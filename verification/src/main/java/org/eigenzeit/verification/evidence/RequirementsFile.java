package org.eigenzeit.verification.evidence;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/** Reads and checks the requirements file (YAML; format in the file's own header). */
public final class RequirementsFile {
  private RequirementsFile() {}

  /**
   * Reads the requirements.
   *
   * @param file the YAML file
   * @return the requirements in file order
   * @throws IOException when the file cannot be read or breaks the format (the message names the
   *     requirement and the field)
   */
  public static List<Requirement> read(Path file) throws IOException {
    final JsonNode root = new ObjectMapper(new YAMLFactory()).readTree(Files.readString(file));
    final JsonNode list = root == null ? null : root.get("requirements");
    if (list == null || !list.isArray() || list.isEmpty()) {
      throw new IOException(file + ": no 'requirements' list");
    }
    final List<Requirement> out = new ArrayList<>();
    final Set<String> ids = new HashSet<>();
    int index = 0;
    for (JsonNode n : list) {
      index++;
      final String where = file.getFileName() + ", requirement " + index;
      final String id = text(n, "id", where);
      if (!ids.add(id)) {
        throw new IOException(where + ": duplicate id " + id);
      }
      final String at = file.getFileName() + ", " + id;
      final String method = text(n, "method", at);
      if (!Requirement.METHODS.contains(method)) {
        throw new IOException(at + ": method '" + method + "' is not one of " + Requirement.METHODS);
      }
      final JsonNode c = n.get("criterion");
      if (c == null || !c.isObject()) {
        throw new IOException(at + ": no criterion");
      }
      final String op = text(c, "op", at + " criterion");
      if (!Requirement.Criterion.OPS.contains(op)) {
        throw new IOException(at + ": criterion op '" + op + "' is not one of " + Requirement.Criterion.OPS);
      }
      final double value = number(c, "value", at + " criterion");
      final double tol = "within".equals(op) ? number(c, "tolerance", at + " criterion") : 0.0;
      out.add(new Requirement(id, text(n, "title", at), text(n, "text", at), method, strings(n, "metric", at, false),
          new Requirement.Criterion(op, value, tol), text(n, "unit", at), text(n, "source", at),
          strings(n, "verified-by", at, true)));
    }
    return out;
  }

  private static String text(JsonNode n, String field, String where) throws IOException {
    final JsonNode v = n.get(field);
    if (v == null || !v.isValueNode() || v.asText().isBlank()) {
      throw new IOException(where + ": missing or empty '" + field + "'");
    }
    return v.asText().strip();
  }

  private static double number(JsonNode n, String field, String where) throws IOException {
    final JsonNode v = n.get(field);
    if (v == null || !v.isNumber() || !Double.isFinite(v.asDouble())) {
      throw new IOException(where + ": '" + field + "' must be a finite number");
    }
    return v.asDouble();
  }

  private static List<String> strings(JsonNode n, String field, String where, boolean mayBeEmpty) throws IOException {
    final JsonNode v = n.get(field);
    final List<String> out = new ArrayList<>();
    if (v != null && v.isArray()) {
      for (JsonNode e : v) {
        out.add(e.asText().strip());
      }
    } else if (v != null && v.isValueNode() && !v.asText().isBlank()) {
      out.add(v.asText().strip());
    }
    if (v == null || (!mayBeEmpty && out.isEmpty())) {
      throw new IOException(where + ": missing '" + field + "'");
    }
    return out;
  }
}
