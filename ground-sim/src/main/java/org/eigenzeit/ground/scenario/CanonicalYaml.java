package org.eigenzeit.ground.scenario;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The canonical text of a resolved scenario: sections in the reader's order, two-space
 * indentation, numbers as {@link Double#toString} or plain integers, text double-quoted. Two
 * scenarios are the same input exactly when their canonical texts are equal.
 */
final class CanonicalYaml {
  private CanonicalYaml() {}

  static String write(Map<String, String> resolved) {
    final Map<String, Object> tree = new LinkedHashMap<>();
    for (Map.Entry<String, String> e : resolved.entrySet()) {
      put(tree, e.getKey().split("\\."), 0, e.getValue());
    }
    final StringBuilder sb = new StringBuilder(2048);
    sb.append("# Canonical form written by Eigenzeit: every key resolved, defaults included.\n");
    emit(sb, tree, "");
    return sb.toString();
  }

  @SuppressWarnings("unchecked")
  private static void put(Map<String, Object> node, String[] parts, int i, String value) {
    if (i == parts.length - 1) {
      node.put(parts[i], value);
      return;
    }
    final Object child = node.computeIfAbsent(parts[i], k -> new LinkedHashMap<String, Object>());
    put((Map<String, Object>) child, parts, i + 1, value);
  }

  @SuppressWarnings("unchecked")
  private static void emit(StringBuilder sb, Map<String, Object> node, String indent) {
    for (Map.Entry<String, Object> e : node.entrySet()) {
      sb.append(indent).append(e.getKey()).append(':');
      if (e.getValue() instanceof Map<?, ?> m) {
        sb.append('\n');
        emit(sb, (Map<String, Object>) m, indent + "  ");
      } else {
        sb.append(' ').append(e.getValue()).append('\n');
      }
    }
  }

  /**
   * The canonical scalar text of a value.
   *
   * @param key dotted key
   * @param value value text (a number's text or a text value, unquoted)
   * @return the canonical scalar
   */
  static String scalarFor(String key, String value) {
    return Scenario.TEXT_KEYS.contains(key) ? quote(value) : value;
  }

  static String quote(String s) {
    final StringBuilder b = new StringBuilder(s.length() + 2).append('"');
    for (int i = 0; i < s.length(); i++) {
      final char c = s.charAt(i);
      if (c == '"' || c == '\\') {
        b.append('\\');
      }
      b.append(c);
    }
    return b.append('"').toString();
  }
}
