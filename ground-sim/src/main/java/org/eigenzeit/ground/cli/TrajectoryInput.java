package org.eigenzeit.ground.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.budget.BudgetAnalysis;
import org.eigenzeit.ground.gnss.GnssFiles;
import org.eigenzeit.ground.gnss.Sp3Header;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.trajectory.ExternalTrajectory;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.eigenzeit.ground.trajectory.OemFile;
import org.eigenzeit.ground.trajectory.Sp3File;
import org.eigenzeit.onboard.body.CentralBody;

/**
 * A trajectory file given to {@code budget}: SP3-c/d (one satellite) or CCSDS OEM, recognised by
 * its first line, with the reference configuration for it (EGM96 degree 36, DE405 Sun and Moon,
 * UT1 - TT of the file's first epoch from the given UT1 - UTC and the leap-second table).
 *
 * @param label label of the budget
 * @param trajectory the interpolated trajectory
 * @param reference the reference configuration
 * @param minRadiusM the smallest sample radius, m (for the core's recommended degree)
 */
record TrajectoryInput(String label, ExternalTrajectory trajectory, ReferenceConfig reference, double minRadiusM) {
  static TrajectoryInput read(Path file, String satellite, double ut1MinusUtcS) {
    final String name = GnssFiles.displayName(file);
    final List<String> lines = GnssFiles.lines(file);
    final ExternalTrajectory traj;
    final String label;
    if (!lines.isEmpty() && (lines.get(0).startsWith("#c") || lines.get(0).startsWith("#d"))) {
      Sp3Header.parse(name, lines);
      final Sp3File sp3 = Sp3File.parse(name, lines);
      if (satellite == null || !sp3.satelliteIds().contains(satellite)) {
        throw new InputException("--satellite", 0, "an SP3 trajectory needs a satellite of the file, found "
            + (satellite == null ? "none" : "'" + satellite + "'") + ", allowed " + sp3.satelliteIds());
      }
      traj = ExternalTrajectory.fromSp3(sp3, satellite, 0.0);
      label = name + " " + satellite;
    } else if (!lines.isEmpty() && lines.get(0).strip().startsWith("CCSDS_OEM_VERS")) {
      if (satellite != null) {
        throw new InputException("--satellite", 0, "applies to SP3 trajectories only, found '" + satellite + "'");
      }
      final OemFile oem = OemFile.parse(name, lines);
      final String centre = String.valueOf(oem.metadata("CENTER_NAME")).toUpperCase(Locale.ROOT);
      if (!centre.equals("EARTH")) {
        throw new InputException(name, 0, "CENTER_NAME: found '" + centre + "', allowed EARTH for a budget trajectory");
      }
      traj = ExternalTrajectory.fromOem(oem, 0.0);
      label = name + " " + oem.metadata("OBJECT_NAME");
    } else {
      throw new InputException(name, 1, "not a trajectory file: SP3 ('#c', '#d') or CCSDS OEM ('CCSDS_OEM_VERS') expected");
    }
    final double ut1MinusTt = ut1MinusUtcS - GnssTimeSystem.taiMinusUtcS(traj.t0Tt()) - 32.184;
    final ExternalTrajectory rotated = traj.withUt1MinusTt(ut1MinusTt);
    final ReferenceConfig ref = new ReferenceConfig(CentralBody.EARTH, 36,
        BudgetAnalysis.referenceFor(CentralBody.EARTH).thirdBodies(), 0, 0, false,
        ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853, 1e-13, ut1MinusTt, null);
    return new TrajectoryInput(label, rotated, ref, rotated.minRadiusM());
  }
}
