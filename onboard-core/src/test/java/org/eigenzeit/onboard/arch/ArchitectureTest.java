package org.eigenzeit.onboard.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Architecture rules of the onboard core, enforced as tests (house style: modules show the
 * architecture; the hot path allocates nothing and reflects on nothing).
 */
class ArchitectureTest {
  private static JavaClasses core;

  @BeforeAll
  static void importCore() {
    core = new ClassFileImporter()
        .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
        .importPackages("org.eigenzeit.onboard");
  }

  @Test
  void coreDependsOnlyOnJavaBase() {
    final com.tngtech.archunit.lang.EvaluationResult result = noClasses().that().resideInAPackage("org.eigenzeit.onboard..")
        .should().dependOnClassesThat().resideOutsideOfPackages(
            "org.eigenzeit.onboard..", "java.lang..", "java.util..", "java.io..", "java.nio..",
            "java.math..")
        .because("onboard-core links into flight software and depends on java.base only")
        .evaluate(core);
    final int violations = result.getFailureReport().getDetails().size();
    System.out.println("evidence: core.non_java_base_dependencies = " + violations);
    System.out.println("evidence: core.classes_inspected = " + core.size());
    org.junit.jupiter.api.Assertions.assertEquals(0, violations, result.getFailureReport().toString());
  }

  @Test
  void noPackageCycles() {
    slices().matching("org.eigenzeit.onboard.(*)..").should().beFreeOfCycles().check(core);
  }

  @Test
  void hotPathUsesNoStreamsFormattingReflectionOrCollections() {
    noClasses().that().resideInAPackage("org.eigenzeit.onboard..")
        .should().dependOnClassesThat().resideInAnyPackage("java.util.stream..", "java.lang.reflect..")
        .orShould().callMethod(String.class, "format", String.class, Object[].class)
        .orShould().dependOnClassesThat().haveFullyQualifiedName("java.util.List")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("java.util.ArrayList")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("java.util.Map")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("java.util.HashMap")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("java.util.Set")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("java.util.Collection")
        .because("the hot path must not allocate, box or reflect")
        .check(core);
  }

  @Test
  void noBoxedNumbersInCore() {
    noClasses().that().resideInAPackage("org.eigenzeit.onboard..")
        .should().callMethod(Double.class, "valueOf", double.class)
        .orShould().callMethod(Integer.class, "valueOf", int.class)
        .orShould().callMethod(Long.class, "valueOf", long.class)
        .because("boxing allocates")
        .check(core);
  }
}
