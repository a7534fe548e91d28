package org.eigenzeit.ground.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioException;
import org.eigenzeit.ground.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A scenario whose truth orbit is a real precise orbit: GPS G05 of the IGS final SP3 of
 * 2010-07-01 (inside the shipped DE405 span, 1999-12-24 to 2040-01-25: the truth's Sun and Moon come from DE405).
 * The oscillator and measurements are invented.
 */
class ExternalTrajectoryScenarioTest {
  @Test
  void closedLoopAlongAnIgsOrbit(@TempDir Path dir) throws Exception {
    final Path sp3 = Path.of(ExternalTrajectoryScenarioTest.class.getResource("/gnss/igs15904.sp3").toURI());
    final Path yaml = dir.resolve("g05.yaml");
    Files.writeString(yaml, "name: g05-2010\nspan_h: 6\ninitial_time_error_ns: 50\noutput_every_s: 60\nut1_minus_tt_s: -66.25\n"
        + "orbit:\n  trajectory:\n    format: sp3\n    file: " + sp3.toAbsolutePath() + "\n    satellite: G05\n"
        + "oscillator:\n  preset: rubidium\nmeasurements:\n  source: 1\n  sigma_ns: 1\n  every_s: 10\n"
        + "servo:\n  time_constant_track_s: 1000\n", StandardCharsets.UTF_8);
    final Scenario s = ScenarioReader.read(yaml);
    final RunResult r = Pipeline.run(s, 0).result();
    System.out.printf("G05 (IGS 2010-07-01) closed loop, 6 h: settle %.0f s, RMS %.3f ns, true rate %.5e, model rate %.5e, %s%n",
        r.settleTimeS(), r.rmsTimeErrorNs(), r.trueRelativisticRate(), r.modelRelativisticRate(), r.thirdBodies());
    assertTrue(r.settleTimeS() >= 0);
    assertTrue(r.rmsTimeErrorNs() < 5.0, "RMS " + r.rmsTimeErrorNs()); // measured 3.19 ns with DE405, convergence included
    // GPS orbit: about +4.46e-10 (IS-GPS-200); the core's model follows the truth to 1e-15 over 6 h.
    assertEquals(4.46e-10, r.trueRelativisticRate(), 0.02e-10);
    assertEquals(r.trueRelativisticRate(), r.modelRelativisticRate(), 1e-15);
    assertTrue(r.thirdBodies().startsWith("JPL DE405"), r.thirdBodies());
  }

  @Test
  void trajectoryKeysAreValidated(@TempDir Path dir) throws IOException {
    final Path yaml = dir.resolve("bad.yaml");
    Files.writeString(yaml, "name: bad\norbit:\n  trajectory:\n    format: sp3\n    file: nowhere.sp3\n", StandardCharsets.UTF_8);
    final String msg = org.junit.jupiter.api.Assertions.assertThrows(ScenarioException.class, () -> ScenarioReader.read(yaml))
        .getMessage();
    assertTrue(msg.contains("orbit.trajectory.file") && msg.contains("no such file"), msg);
    Files.writeString(yaml, "name: bad\norbit:\n  trajectory:\n    format: tle\n    file: x\n", StandardCharsets.UTF_8);
    assertTrue(org.junit.jupiter.api.Assertions.assertThrows(ScenarioException.class, () -> ScenarioReader.read(yaml))
        .getMessage().contains("allowed oem, sp3"));
  }
}
