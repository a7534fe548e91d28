package org.eigenzeit.ground.arch;

import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.EvaluationResult;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Architecture rules of the ground simulator (docs/architecture.md): no package cycles, and one
 * way down the layers: cli, then campaign, then report, then pipeline (setup, loop, summary), then
 * loop and scenario, then the models (truth, reference, trajectory, ephemeris, budget, stats). The
 * loop knows no scenario: it runs the plan the setup step made.
 */
class GroundArchitectureTest {
  private static JavaClasses ground;

  @BeforeAll
  static void importGround() {
    ground = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
        .importPackages("org.eigenzeit.ground");
  }

  @Test
  void noPackageCycles() {
    final EvaluationResult r = slices().matching("org.eigenzeit.ground.(*)..").should().beFreeOfCycles().evaluate(ground);
    System.out.println("evidence: ground.package_cycles = " + r.getFailureReport().getDetails().size());
    Assertions.assertFalse(r.hasViolation(), r.getFailureReport().toString());
  }

  @Test
  void layersAreUsedOneWayDown() {
    final String g = "org.eigenzeit.ground.";
    layeredArchitecture().consideringOnlyDependenciesInLayers()
        .layer("CLI").definedBy(g + "cli..")
        .layer("Campaign").definedBy(g + "campaign..")
        .layer("Report").definedBy(g + "report..")
        .layer("Pipeline").definedBy(g + "pipeline..")
        .layer("Loop").definedBy(g + "loop..")
        .layer("Scenario").definedBy(g + "scenario..")
        .layer("Models").definedBy(g + "truth..", g + "reference..", g + "trajectory..", g + "gnss..", g + "input..", g + "instant..", g + "uplink..", g + "timescale..", g + "ephemeris..", g + "budget..",
            g + "stats..")
        .whereLayer("CLI").mayNotBeAccessedByAnyLayer()
        .whereLayer("Campaign").mayOnlyBeAccessedByLayers("CLI")
        .whereLayer("Report").mayOnlyBeAccessedByLayers("Campaign", "CLI")
        .whereLayer("Pipeline").mayOnlyBeAccessedByLayers("Report", "Campaign", "CLI")
        .whereLayer("Loop").mayOnlyBeAccessedByLayers("Pipeline")
        .whereLayer("Scenario").mayOnlyBeAccessedByLayers("Pipeline", "Report", "Campaign", "CLI")
        .whereLayer("Models").mayOnlyBeAccessedByLayers("Scenario", "Loop", "Pipeline", "Report", "Campaign", "CLI")
        .because("data flows one way: scenario -> setup -> loop -> summary -> campaign outputs")
        .check(ground);
  }
}
