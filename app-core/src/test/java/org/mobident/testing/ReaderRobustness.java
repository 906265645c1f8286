package org.mobident.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HexFormat;

import org.mobident.InputException;

/**
 * Shared body of the reader robustness tests: a damaged file must give a valid result or an
 * {@link InputException} that names the file, never another exception, and must not hang.
 */
public final class ReaderRobustness {

    /** Guard against endless loops only; a healthy read of these small files takes well under a millisecond. */
    public static final Duration HANG_GUARD = Duration.ofSeconds(10);

    /** Longest piece of a damaged file shown in a failure message. */
    private static final int SHOWN_BYTES = 600;

    /** A reader of one file format. */
    @FunctionalInterface
    public interface FileReader<T> {
        T read(Path file) throws InputException;
    }

    /** Either a value or the domain error, never both. */
    public record Outcome<T>(T value, InputException error) {
        public boolean failed() {
            return error != null;
        }
    }

    private ReaderRobustness() {
    }

    /**
     * Writes {@code bytes} to {@code file} and reads it under {@link #HANG_GUARD}. An
     * {@link InputException} is checked to name {@code file} (as {@code file.toString()}), a line
     * that is not negative and a non-empty problem, and returned; any other exception or a hang
     * fails the test with {@code context} and the damaged bytes in the message.
     */
    public static <T> Outcome<T> read(Path file, byte[] bytes, FileReader<T> reader, String context)
            throws IOException {
        Files.write(file, bytes);
        String shown = context + "; file bytes (hex, first " + SHOWN_BYTES + "): "
                + HexFormat.of().formatHex(bytes, 0, Math.min(bytes.length, SHOWN_BYTES));
        Outcome<T> outcome;
        try {
            outcome = assertTimeoutPreemptively(HANG_GUARD, () -> {
                try {
                    return new Outcome<T>(reader.read(file), null);
                } catch (InputException e) {
                    return new Outcome<T>(null, e);
                }
            }, () -> "the reader hung: " + shown);
        } catch (RuntimeException | StackOverflowError | OutOfMemoryError e) {
            return fail("not a domain error: " + e + "; " + shown, e);
        }
        if (outcome.failed()) {
            InputException e = outcome.error();
            assertEquals(file.toString(), e.file(), () -> "the message must name the file: " + e.getMessage());
            assertTrue(e.getMessage().startsWith(file.toString()), e::getMessage);
            assertTrue(e.line() >= 0, e::getMessage);
            assertFalse(e.problem() == null || e.problem().isBlank(), e::getMessage);
        }
        return outcome;
    }
}
