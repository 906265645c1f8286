package org.mobident.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * The archive scenario is the speed benchmark and its peak table a regression check, so its
 * output must stay byte for byte the same while the simulator grows. The checksum below was
 * computed from the archive written before the lab-day scenario was added, and again after the run
 * sheet began to name the library's buffer (empty for this library without labels, "archive"
 * before): the three traces were compared byte for byte with those of the earlier version then.
 */
class ArchiveRegressionTest {

    /** SHA-256 over every file name and content of the small archive below, in name order. */
    private static final String ARCHIVE_SHA256 = "fa957cdb6643139858d0e1d7a8e06b50abd0337bbc75b5f9942888fcd35b8583";

    @Test
    void smallArchiveIsByteForByteUnchanged(@TempDir Path dir) throws IOException, NoSuchAlgorithmException {
        // Invented anions (and one cation the archive must skip); values of no real buffer.
        Library library = new Library(List.of(
                LibraryEntry.of("alpha", -76.3, 0.4),
                LibraryEntry.of("beta", -70.1, 0.3),
                LibraryEntry.of("gamma", -55.8, Double.NaN),
                LibraryEntry.of("delta", -41.2, 0.5),
                LibraryEntry.of("epsilon", 52.0, 0.3)), "invented", List.of());
        ArchiveGenerator.write(library, 3, 2_000, 11, dir, false);
        MessageDigest sha = MessageDigest.getInstance("SHA-256");
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.sorted().toList();
        }
        assertEquals(4, files.size(), "three traces and the run sheet");
        for (Path f : files) {
            sha.update(f.getFileName().toString().getBytes(java.nio.charset.StandardCharsets.UTF_8));
            sha.update(Files.readAllBytes(f));
        }
        assertEquals(ARCHIVE_SHA256, HexFormat.of().formatHex(sha.digest()));
    }
}
