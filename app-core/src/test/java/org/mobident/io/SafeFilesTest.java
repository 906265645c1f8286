package org.mobident.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.Set;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SafeFilesTest {

    @TempDir
    Path dir;

    private List<String> namesIn(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().collect(Collectors.toList());
        }
    }

    @Test
    void writesNewFileAsUtf8AndLeavesNoTemporaryFile() throws IOException {
        Path target = dir.resolve("table.csv");
        SafeFiles.write(target, false, w -> w.write("mobility,µ\n-12.5,Ω\n"));
        assertEquals("mobility,µ\n-12.5,Ω\n", Files.readString(target, StandardCharsets.UTF_8));
        assertEquals(List.of("table.csv"), namesIn(dir));
    }

    @Test
    void writerFailureLeavesOldContentAndNoTemporaryFile() throws IOException {
        Path target = dir.resolve("table.csv");
        Files.writeString(target, "old content");
        IOException thrown = assertThrows(IOException.class, () -> SafeFiles.write(target, true, w -> {
            w.write("half of the new ");
            w.flush();
            throw new IOException("disk on fire");
        }));
        assertEquals("disk on fire", thrown.getMessage());
        assertEquals("old content", Files.readString(target));
        assertEquals(List.of("table.csv"), namesIn(dir));
    }

    @Test
    void uncheckedWriterFailureAlsoCleansUp() throws IOException {
        Path target = dir.resolve("new.json");
        assertThrows(UncheckedIOException.class, () -> SafeFiles.write(target, false, w -> {
            w.write("{");
            throw new UncheckedIOException(new IOException("stream broke"));
        }));
        assertFalse(Files.exists(target));
        assertEquals(List.of(), namesIn(dir));
    }

    @Test
    void refusesToOverwriteBeforeDoingAnyWork() throws IOException {
        Path target = dir.resolve("report.html");
        Files.writeString(target, "keep me");
        AtomicBoolean called = new AtomicBoolean();
        FileAlreadyExistsException e = assertThrows(FileAlreadyExistsException.class,
                () -> SafeFiles.write(target, false, "use --overwrite to replace it", w -> called.set(true)));
        assertFalse(called.get(), "the writer must not run when the target exists");
        assertTrue(e.getMessage().contains("report.html"), e.getMessage());
        assertTrue(e.getMessage().contains("exists; use --overwrite to replace it"), e.getMessage());
        assertEquals("keep me", Files.readString(target));
        assertEquals(List.of("report.html"), namesIn(dir));
    }

    @Test
    void neutralWordingWhenNoOptionIsNamed() throws IOException {
        Path target = dir.resolve("a.csv");
        Files.writeString(target, "x");
        FileAlreadyExistsException e = assertThrows(FileAlreadyExistsException.class,
                () -> SafeFiles.write(target, false, w -> w.write("y")));
        assertTrue(e.getMessage().contains(SafeFiles.NEUTRAL_OVERWRITE_HINT), e.getMessage());
    }

    @Test
    void overwriteReplacesContent() throws IOException {
        Path target = dir.resolve("a.csv");
        Files.writeString(target, "old, longer content");
        SafeFiles.write(target, true, w -> w.write("new"));
        assertEquals("new", Files.readString(target));
        assertEquals(List.of("a.csv"), namesIn(dir));
    }

    @Test
    void bytesVariantWritesExactBytes() throws IOException {
        Path target = dir.resolve("blob.bin");
        byte[] data = new byte[100_000];
        for (int i = 0; i < data.length; i++) {
            data[i] = (byte) (i * 31);
        }
        SafeFiles.writeBytes(target, false, out -> {
            for (byte b : data) {
                out.write(b);
            }
        });
        byte[] back = Files.readAllBytes(target);
        assertEquals(data.length, back.length);
        for (int i = 0; i < data.length; i++) {
            assertEquals(data[i], back[i], "byte " + i);
        }
    }

    @Test
    void missingFolderIsReportedAndNothingIsCreated() {
        Path target = dir.resolve("no-such-folder").resolve("x.csv");
        assertThrows(NoSuchFileException.class, () -> SafeFiles.write(target, false, w -> w.write("x")));
        assertFalse(Files.exists(target.getParent()));
    }

    @Test
    void keepsPreviousVersion() throws IOException {
        Path lib = dir.resolve("library.csv");
        assertNull(SafeFiles.writeKeepingPrevious(lib, w -> w.write("v1")), "nothing to keep yet");
        assertEquals("v1", Files.readString(lib));
        assertEquals(List.of("library.csv"), namesIn(dir));

        Path kept = SafeFiles.writeKeepingPrevious(lib, w -> w.write("v2"));
        assertEquals(dir.resolve("library.csv.prev").toAbsolutePath(), kept);
        assertEquals("v2", Files.readString(lib));
        assertEquals("v1", Files.readString(kept));

        SafeFiles.writeKeepingPrevious(lib, w -> w.write("v3"));
        assertEquals("v3", Files.readString(lib));
        assertEquals("v2", Files.readString(kept), "only the latest previous version is kept");
        assertEquals(List.of("library.csv", "library.csv.prev"), namesIn(dir));
    }

    @Test
    void keepPreviousFailureTouchesNeitherFile() throws IOException {
        Path lib = dir.resolve("library.csv");
        SafeFiles.writeKeepingPrevious(lib, w -> w.write("v1"));
        SafeFiles.writeKeepingPrevious(lib, w -> w.write("v2"));
        assertThrows(IOException.class, () -> SafeFiles.writeKeepingPrevious(lib, w -> {
            w.write("v3 partial");
            throw new IOException("interrupted");
        }));
        assertEquals("v2", Files.readString(lib));
        assertEquals("v1", Files.readString(SafeFiles.previousOf(lib)));
        assertEquals(List.of("library.csv", "library.csv.prev"), namesIn(dir));
    }

    @Test
    void aFolderInTheWayIsNeitherReplacedNorKeptAsPrevious() throws IOException {
        Path folder = Files.createDirectories(dir.resolve("library.csv").resolve("inside"));
        IOException e = assertThrows(IOException.class,
                () -> SafeFiles.writeKeepingPrevious(folder.getParent(), w -> w.write("v1")));
        assertTrue(e.getMessage().contains("folder"), e.getMessage());
        assertEquals(List.of("library.csv"), namesIn(dir), "no .prev copy of the folder, no temporary file");
        assertEquals(List.of("inside"), namesIn(folder.getParent()));
        IOException plain = assertThrows(IOException.class,
                () -> SafeFiles.write(folder.getParent(), true, w -> w.write("v1")));
        assertTrue(plain.getMessage().contains("library.csv"), plain.getMessage());
        assertEquals(List.of("library.csv"), namesIn(dir), "the failed move leaves no temporary file");
    }

    @Test
    void newFilesGetDefaultPermissionsAndReplacementsKeepTheirs() throws IOException {
        assumeTrue(Files.getFileStore(dir).supportsFileAttributeView(PosixFileAttributeView.class), "POSIX only");
        Path plain = Files.createFile(dir.resolve("plain.txt"));
        Path target = dir.resolve("report.csv");
        SafeFiles.write(target, false, w -> w.write("a"));
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(target),
                "same permissions as any new file (not owner-only like a temp file)");

        Set<PosixFilePermission> custom = PosixFilePermissions.fromString("rw-rw----");
        Files.setPosixFilePermissions(target, custom);
        SafeFiles.write(target, true, w -> w.write("b"));
        assertEquals(custom, Files.getPosixFilePermissions(target));
    }
}
