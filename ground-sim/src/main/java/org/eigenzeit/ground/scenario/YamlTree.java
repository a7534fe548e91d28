package org.eigenzeit.ground.scenario;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A strict reading of one YAML document into mappings of scalars, each with its line: a duplicate
 * key, a list, an alias, an anchor, a tag or a second document is refused with the file and line.
 * Built on Jackson's YAML token stream (SnakeYAML underneath); no library text reaches the user.
 */
final class YamlTree {
  private static final YAMLFactory FACTORY = new YAMLFactory();

  private YamlTree() {}

  /** A node: a mapping or a scalar, with the line it starts on. */
  sealed interface Node permits Mapping, Scalar {
    /** @return 1-based line */
    int line();
  }

  /**
   * A mapping in file order.
   *
   * @param line 1-based line of its first key (or of the key that holds it)
   * @param entries keys in file order
   */
  record Mapping(int line, Map<String, Node> entries) implements Node {
    Mapping {
      entries = Collections.unmodifiableMap(new LinkedHashMap<>(entries));
    }
  }

  /**
   * A scalar.
   *
   * @param line 1-based line
   * @param text the scalar's text as written (quotes removed)
   * @param kind what YAML made of it: "text", "integer", "number", "boolean" or "empty"
   * @param quoted true when written in quotes (then it is text, never a number)
   */
  record Scalar(int line, String text, String kind, boolean quoted) implements Node {}

  /**
   * Parses a YAML text that must hold exactly one mapping.
   *
   * @param file name for messages
   * @param text the YAML text
   * @return the root mapping
   * @throws ScenarioException naming the file and line
   */
  static Mapping parse(String file, String text) {
    final String[] lines = text.split("\n", -1);
    try (YAMLParser p = FACTORY.createParser(text)) {
      final JsonToken first = p.nextToken();
      if (first == null) {
        throw new ScenarioException(file, 1, "", "the file holds no YAML document", "nothing",
            "a mapping of the keys in docs/campaigns.md");
      }
      if (first != JsonToken.START_OBJECT) {
        throw new ScenarioException(file, line(p), "", "the document must be a mapping of keys", describe(p),
            "a mapping of the keys in docs/campaigns.md");
      }
      final Mapping root = mapping(file, p, "", line(p), lines);
      final JsonToken after = p.nextToken();
      if (after != null) {
        throw new ScenarioException(file, line(p), "", "a second YAML document follows the first", "a second document",
            "exactly one document per scenario file");
      }
      return root;
    } catch (StreamReadException e) {
      final JsonLocation loc = e.getLocation();
      final int ln = loc == null ? 1 : Math.max(1, loc.getLineNr());
      final String shown = ln <= lines.length ? lines[ln - 1].strip() : "";
      throw new ScenarioException(file, ln, "", "not valid YAML here (check the indentation, ':' and quotes)",
          "'" + clip(shown) + "'", "a YAML mapping of 'key: value' lines");
    } catch (IOException e) {
      throw new ScenarioException(file, 1, "", "the text cannot be read", "unreadable text", "UTF-8 YAML");
    }
  }

  private static Mapping mapping(String file, YAMLParser p, String path, int startLine, String[] lines)
      throws IOException {
    refuseDecorations(file, p, path);
    final Map<String, Node> entries = new LinkedHashMap<>();
    final Map<String, Integer> lineOf = new LinkedHashMap<>();
    int first = -1;
    for (JsonToken t = p.nextToken(); t != JsonToken.END_OBJECT; t = p.nextToken()) {
      if (t != JsonToken.FIELD_NAME) {
        throw new ScenarioException(file, line(p), path, "expected a key", describe(p), "'key: value'");
      }
      final String key = p.currentName();
      final int keyLine = line(p);
      if (first < 0) {
        first = keyLine;
      }
      final String full = path.isEmpty() ? key : path + "." + key;
      if (lineOf.containsKey(key)) {
        throw new ScenarioException(file, keyLine, full, "duplicate key (first at line " + lineOf.get(key) + ")",
            "a second '" + key + "'", "each key once per section");
      }
      lineOf.put(key, keyLine);
      final JsonToken v = p.nextToken();
      refuseDecorations(file, p, full);
      if (v == JsonToken.START_OBJECT) {
        entries.put(key, mapping(file, p, full, keyLine, lines));
      } else if (v == JsonToken.START_ARRAY) {
        throw new ScenarioException(file, line(p), full, "lists are not part of the scenario format", "a list",
            "a single value or a mapping");
      } else {
        entries.put(key, new Scalar(line(p), p.getText() == null ? "" : p.getText(), kind(v), quoted(p, lines)));
      }
    }
    return new Mapping(first < 0 ? startLine : first, entries);
  }

  private static void refuseDecorations(String file, YAMLParser p, String path) throws IOException {
    if (p.isCurrentAlias()) {
      throw new ScenarioException(file, line(p), path, "YAML aliases are not accepted", "alias '*" + p.getText() + "'",
          "the value written out");
    }
    if (p.getObjectId() != null) {
      throw new ScenarioException(file, line(p), path, "YAML anchors are not accepted", "anchor '&" + p.getObjectId() + "'",
          "plain values");
    }
    if (p.getTypeId() != null) {
      throw new ScenarioException(file, line(p), path, "YAML tags are not accepted", "tag '" + p.getTypeId() + "'",
          "plain values");
    }
  }

  private static String kind(JsonToken t) {
    return switch (t) {
      case VALUE_NUMBER_INT -> "integer";
      case VALUE_NUMBER_FLOAT -> "number";
      case VALUE_TRUE, VALUE_FALSE -> "boolean";
      case VALUE_NULL -> "empty";
      default -> "text";
    };
  }

  private static String describe(JsonParser p) throws IOException {
    final JsonToken t = p.currentToken();
    if (t == JsonToken.START_ARRAY) {
      return "a list";
    }
    if (t == JsonToken.START_OBJECT) {
      return "a mapping";
    }
    return "'" + clip(p.getText()) + "'";
  }

  private static boolean quoted(JsonParser p, String[] lines) {
    final JsonLocation loc = p.currentTokenLocation();
    if (loc == null || loc.getLineNr() < 1 || loc.getLineNr() > lines.length) {
      return false;
    }
    final String l = lines[loc.getLineNr() - 1];
    final int c = loc.getColumnNr() - 1;
    return c >= 0 && c < l.length() && (l.charAt(c) == '"' || l.charAt(c) == '\'');
  }

  private static int line(JsonParser p) {
    final JsonLocation loc = p.currentTokenLocation();
    return loc == null ? 1 : Math.max(1, loc.getLineNr());
  }

  static String clip(String s) {
    if (s == null) {
      return "";
    }
    final StringBuilder b = new StringBuilder();
    for (int i = 0; i < s.length() && b.length() < 60; i++) {
      final char c = s.charAt(i);
      b.append(c >= 0x20 && c < 0x7f ? c : '?');
    }
    return s.length() > 60 ? b + "..." : b.toString();
  }
}
