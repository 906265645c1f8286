package org.mobident.structure;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The engine's shape, checked on its compiled classes with ArchUnit: no package depends on
 * another that depends back on it (directly or round about), and the engine never reaches for a
 * command line, Swing or a way to end the process.
 */
class EngineStructureTest {

    private static JavaClasses engine;

    @BeforeAll
    static void importEngine() {
        engine = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.mobident");
    }

    @Test
    void packagesHaveNoCycles() {
        slices().matching("org.mobident.(**)").should().beFreeOfCycles().check(engine);
    }

    @Test
    void theEngineKnowsNoCommandLineAndNoSwing() {
        noClasses().should().dependOnClassesThat().resideInAnyPackage("picocli..", "javax.swing..",
                "org.mobident.cli..", "org.mobident.viewer..").check(engine);
    }

    @Test
    void theEngineNeverEndsTheProcessOrPrints() {
        noClasses().should().callMethod(System.class, "exit", int.class).check(engine);
        noClasses().should().accessField(System.class, "out").orShould().accessField(System.class, "err")
                .check(engine);
    }
}
