package org.mobident.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.tngtech.archunit.core.domain.Dependency;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.lang.module.ModuleDescriptor;
import java.lang.module.ModuleFinder;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.mobident.result.RunResult;

/**
 * What the command line and the viewer may use of the engine: what its module
 * ({@code app-core/src/main/java/module-info.java}) exports. The command line runs on the class
 * path, where the module's exports are not enforced, so this test enforces them: a front-end class
 * that reaches into a package the engine keeps to itself (peak finding, mobility scales, matching,
 * the identification pipeline, the buffer chemistry) fails it.
 */
class EngineApiTest {

    private static ModuleDescriptor engineModule() throws URISyntaxException {
        Path location = Path.of(RunResult.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        return ModuleFinder.of(location).findAll().iterator().next().descriptor();
    }

    @Test
    void frontEndsUseOnlyWhatTheEngineExports() throws URISyntaxException {
        ModuleDescriptor engine = engineModule();
        assertEquals("org.mobident.core", engine.name());
        Set<String> exported = engine.exports().stream().filter(e -> !e.isQualified())
                .map(ModuleDescriptor.Exports::source).collect(Collectors.toSet());
        assertFalse(exported.contains("org.mobident.signal"), "the peak finding must stay inside the engine");
        JavaClasses frontEnds = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.mobident.cli", "org.mobident.viewer");
        Set<String> reached = new TreeSet<>();
        for (JavaClass c : frontEnds) {
            for (Dependency d : c.getDirectDependenciesFromSelf()) {
                JavaClass target = d.getTargetClass().isArray() ? d.getTargetClass().getBaseComponentType()
                        : d.getTargetClass();
                String pkg = target.getPackageName();
                if (pkg.startsWith("org.mobident") && !pkg.startsWith("org.mobident.cli")
                        && !pkg.startsWith("org.mobident.viewer") && !exported.contains(pkg)) {
                    reached.add(c.getName() + " -> " + target.getName());
                }
            }
        }
        assertEquals(Set.of(), reached);
    }
}
