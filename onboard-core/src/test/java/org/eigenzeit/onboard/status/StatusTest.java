package org.eigenzeit.onboard.status;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Every status code has a distinct name and a definite class (usable or fault). */
class StatusTest {
  @Test
  void namesAreDistinctAndClassesDisjoint() {
    final Set<String> names = new HashSet<>();
    for (int c = 0; c < Status.COUNT; c++) {
      final String n = Status.name(c);
      if (!"UNKNOWN".equals(n)) {
        assertTrue(names.add(n), n);
        assertNotEquals(Status.isFault(c), Status.isUsable(c), n);
      }
    }
    assertEquals(28, names.size());
    assertEquals("UNKNOWN", Status.name(-1));
    assertEquals("UNKNOWN", Status.name(Status.COUNT));
    assertFalse(Status.isUsable(-1));
  }

  /** Each code's name is the name of its constant, so telemetry decoders can rely on it. */
  @Test
  void namesMatchTheConstants() throws IllegalAccessException {
    int checked = 0;
    for (java.lang.reflect.Field f : Status.class.getFields()) {
      if (f.getType() != int.class || "FIRST_FAULT".equals(f.getName()) || "COUNT".equals(f.getName())) {
        continue;
      }
      assertEquals(f.getName(), Status.name(f.getInt(null)));
      checked++;
    }
    assertEquals(28, checked);
  }
}
