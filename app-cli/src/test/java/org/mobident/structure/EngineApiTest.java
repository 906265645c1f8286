package org.mobident.structure;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * What the command line and the viewer may use of the engine. The packages that compute (peak
 * finding, mobility scales, matching, the identification pipeline, the buffer chemistry) are
 * reached only through the use cases of {@code org.mobident.usecase}; from those packages the
 * front ends see value types only (records, enums, interfaces: results, settings, scales). Readers,
 * writers, renderers and the use cases themselves are the rest of the engine's surface.
 */
class EngineApiTest {

    private static final String[] COMPUTING = {"org.mobident.signal..", "org.mobident.mobility..",
        "org.mobident.matching..", "org.mobident.pipeline..", "org.mobident.chem.."};

    private static final DescribedPredicate<JavaClass> COMPUTING_CLASS =
            new DescribedPredicate<>("a class (not a record, enum or interface) of a computing package") {
                @Override
                public boolean test(JavaClass c) {
                    boolean valueType = c.isEnum() || c.isInterface() || c.getRawSuperclass()
                            .map(s -> s.getName().equals("java.lang.Record")).orElse(false);
                    return !valueType && JavaClass.Predicates.resideInAnyPackage(COMPUTING).test(c);
                }
            };

    @Test
    void frontEndsUseTheComputingPackagesOnlyThroughValueTypes() {
        JavaClasses frontEnds = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.mobident.cli", "org.mobident.viewer");
        noClasses().that().resideInAnyPackage("org.mobident.cli..", "org.mobident.viewer..")
                .should().dependOnClassesThat(COMPUTING_CLASS).check(frontEnds);
    }
}
