package org.mobident.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaCodeUnit;
import com.tngtech.archunit.core.domain.JavaField;
import com.tngtech.archunit.core.domain.JavaModifier;
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
 * The engine's module states its interface: the use cases, the value types and the readers,
 * writers and renderers are exported; the packages that compute are not, and nothing exported
 * hands out or takes one of their types.
 */
class EngineModuleTest {

    /** The packages that compute; the front ends reach them only through the use cases. */
    static final Set<String> COMPUTING = Set.of("org.mobident.signal", "org.mobident.mobility",
            "org.mobident.matching", "org.mobident.pipeline", "org.mobident.chem");

    /** The engine's module descriptor, whether the tests run on the module path or the class path. */
    static ModuleDescriptor descriptor() {
        ModuleDescriptor own = RunResult.class.getModule().getDescriptor();
        if (own != null) {
            return own;
        }
        try {
            Path location = Path.of(RunResult.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            return ModuleFinder.of(location).findAll().iterator().next().descriptor();
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static Set<String> exported(ModuleDescriptor d) {
        return d.exports().stream().filter(e -> !e.isQualified()).map(ModuleDescriptor.Exports::source)
                .collect(Collectors.toCollection(TreeSet::new));
    }

    @Test
    void exportsEveryPackageButTheComputingOnes() {
        ModuleDescriptor d = descriptor();
        assertNotNull(d);
        assertEquals("org.mobident.core", d.name());
        // the engine's own packages (on the module path the test packages are patched into the module)
        Set<String> packages = engine().stream().map(JavaClass::getPackageName)
                .collect(Collectors.toCollection(TreeSet::new));
        assertTrue(packages.containsAll(COMPUTING), "a computing package was renamed or removed: " + COMPUTING);
        Set<String> expected = new TreeSet<>(packages);
        expected.removeAll(COMPUTING);
        assertEquals(expected, exported(d), "a new package must be either exported or named as computing here");
    }

    @Test
    void exportedSignaturesNameNoTypeOfAComputingPackage() {
        Set<String> exported = exported(descriptor());
        Set<String> leaks = new TreeSet<>();
        for (JavaClass c : engine()) {
            if (!exported.contains(c.getPackageName()) || !visible(c)) {
                continue;
            }
            for (JavaCodeUnit u : c.getCodeUnits()) {
                if (visible(u.getModifiers())) {
                    u.getParameterTypes().forEach(t -> t.getAllInvolvedRawTypes()
                            .forEach(r -> note(leaks, exported, u.getFullName(), r)));
                    u.getReturnType().getAllInvolvedRawTypes().forEach(r -> note(leaks, exported, u.getFullName(), r));
                }
            }
            for (JavaField f : c.getFields()) {
                if (visible(f.getModifiers())) {
                    f.getType().getAllInvolvedRawTypes().forEach(r -> note(leaks, exported, f.getFullName(), r));
                }
            }
        }
        assertEquals(Set.of(), leaks);
    }

    private static JavaClasses engine() {
        return new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.mobident");
    }

    private static boolean visible(JavaClass c) {
        for (JavaClass k = c; k != null; k = k.getEnclosingClass().orElse(null)) {
            if (!k.getModifiers().contains(JavaModifier.PUBLIC)) {
                return false;
            }
        }
        return true;
    }

    private static boolean visible(Set<JavaModifier> modifiers) {
        return modifiers.contains(JavaModifier.PUBLIC) || modifiers.contains(JavaModifier.PROTECTED);
    }

    private static void note(Set<String> leaks, Set<String> exported, String where, JavaClass type) {
        JavaClass base = type.isArray() ? type.getBaseComponentType() : type;
        String pkg = base.getPackageName();
        if (pkg.startsWith("org.mobident") && !exported.contains(pkg)) {
            leaks.add(where + " -> " + base.getName());
        }
    }
}
