package org.mobident.recheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

class BufferSpecTest {

    private static LibraryEntry e(String name, String buffer, double pH, double ionicMm, double t) {
        return new LibraryEntry(name, -50, 0.3, 0, -1, Double.NaN, List.of(), List.of(), buffer, pH, ionicMm, t, null);
    }

    @Test
    void unitsAndValidation() {
        BufferSpec b = BufferSpec.of("CHR-8", 8.0, 12, 25);
        assertEquals(0.012, b.ionicStrengthMolar(), 1e-15);
        assertEquals(12, b.ionicStrengthMm(), 1e-12);
        assertEquals(8.0, b.conditions().pH(), 0);
        assertEquals("CHR-8 (pH 8.00, I 12.0 mmol/L, 25.0 °C)", b.describe());
        assertThrows(IllegalArgumentException.class, () -> BufferSpec.of("x", 15, 10, 25));
        assertThrows(IllegalArgumentException.class, () -> BufferSpec.of("x", 7, 600, 25));
        assertThrows(IllegalArgumentException.class, () -> BufferSpec.of("x", 7, 10, Double.NaN));
    }

    @Test
    void readsAgreeingEntriesAndFillsFromNotes() throws InputException {
        Library lib = new Library(List.of(e("a", "CHR-8", 8.0, Double.NaN, 25), e("b", null, 8.0, Double.NaN, Double.NaN)),
                "lib.csv", List.of("some remark", "ionic_strength_mm: 12", "Temperature_C = 25"));
        BufferSpec b = BufferSpec.fromLibrary(lib).build();
        assertEquals(BufferSpec.of("CHR-8", 8.0, 12, 25), b);
    }

    @Test
    void conflictingValuesNameBothAnalytes() {
        Library lib = new Library(List.of(e("bromide", "CHR-8", 8.0, 12, 25), e("potassium", "CHR-8", 4.5, 8, 25)),
                "lib.csv", List.of());
        InputException ex = assertThrows(InputException.class, () -> BufferSpec.fromLibrary(lib));
        assertEquals("ph", ex.field());
        assertTrue(ex.getMessage().contains("bromide") && ex.getMessage().contains("potassium"), ex.getMessage());
        Library labels = new Library(List.of(e("a", "CHR-8", 8.0, 12, 25), e("b", "IMZ-4.5", 8.0, 12, 25)),
                "lib.csv", List.of());
        assertEquals("buffer", assertThrows(InputException.class, () -> BufferSpec.fromLibrary(labels)).field());
        Library badNote = new Library(List.of(e("a", null, 8.0, 12, 25)), "lib.csv", List.of("ph: eight"));
        assertEquals("ph", assertThrows(InputException.class, () -> BufferSpec.fromLibrary(badNote)).field());
    }

    @Test
    void builderOverridesAndReportsWhatIsMissing() throws InputException {
        Library lib = new Library(List.of(e("a", "X", 8.0, Double.NaN, Double.NaN)), "lib.csv", List.of());
        BufferSpec.Builder b = BufferSpec.fromLibrary(lib);
        assertEquals(List.of("ionic_strength_mm"), b.missing());
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, b::build);
        assertTrue(ex.getMessage().contains("ionic_strength_mm"));
        BufferSpec built = b.override(BufferSpec.builder().ionicStrengthMm(20).pH(7.5)).build();
        assertEquals(BufferSpec.of("X", 7.5, 20, 25), built, "25 °C when no temperature is stated");
    }

    @Test
    void entryConditionsOverrideTheLibraryBuffer() throws InputException {
        BufferSpec fallback = BufferSpec.of("L", 7, 10, 30);
        assertEquals(BufferSpec.of("E", 5, 10, 30), BufferSpec.forEntry(e("a", "E", 5, Double.NaN, Double.NaN), fallback, "f"));
        InputException ex = assertThrows(InputException.class,
                () -> BufferSpec.forEntry(e("a", null, 5, Double.NaN, 25), null, "lib.csv"));
        assertEquals("ionic_strength_mm", ex.field());
        assertEquals("lib.csv", ex.file());
    }
}
