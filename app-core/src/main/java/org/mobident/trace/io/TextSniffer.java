package org.mobident.trace.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

import org.mobident.InputException;
import org.mobident.io.TextFiles;

/** Checks that bytes are plain 8-bit text (decoding them is {@link org.mobident.io.TextFiles}). */
final class TextSniffer {

    /** How many leading bytes are inspected for NUL and control bytes. */
    private static final int SAMPLE_BYTES = 8192;
    /** Share of NUL bytes in the sample above which NULs at one parity mean UTF-16 (ASCII text as UTF-16 is ~50 %). */
    private static final double UTF16_NUL_SHARE = 0.2;
    /** Share of NULs that must sit at the same parity (even or odd offsets) for UTF-16. */
    private static final double UTF16_PARITY_SHARE = 0.9;
    /** Share of control bytes (other than tab, CR, LF, FF) above which a file is not text. */
    private static final double BINARY_CONTROL_SHARE = 0.01;

    /** Largest file read into one byte array. */
    private static final long MAX_FILE_BYTES = Integer.MAX_VALUE - 64;

    private TextSniffer() {
    }

    /** Reads a whole file; every failure is an {@link InputException} naming {@code display}. */
    static byte[] readAllBytes(Path file, String display) throws InputException {
        try {
            if (Files.isDirectory(file)) {
                throw new InputException(display, 0, null, "is a folder, not a file");
            }
            if (Files.size(file) > MAX_FILE_BYTES) {
                throw new InputException(display, 0, null, "is too large to read");
            }
            return Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new InputException(display, 0, null, "file not found", e);
        } catch (AccessDeniedException e) {
            throw new InputException(display, 0, null, "cannot be read (access denied)", e);
        } catch (IOException e) {
            throw new InputException(display, 0, null, "cannot be read: " + e.getMessage(), e);
        }
    }

    /**
     * The text as UTF-8 bytes: UTF-16 text (a byte order mark, or NULs at one parity of the first
     * {@value #SAMPLE_BYTES} bytes, as Windows programs write "Unicode" text) re-encoded, anything
     * else returned as it is. Line ends and line numbers are kept.
     */
    static byte[] asUtf8(byte[] b) {
        java.nio.charset.Charset charset = b.length >= 2 ? TextFiles.utf16ByMark(b[0] & 0xFF, b[1] & 0xFF) : null;
        int skip = charset != null ? 2 : 0;
        if (charset == null) {
            int[] nuls = nulsByParity(b);
            int nul = nuls[0] + nuls[1];
            int n = Math.min(b.length, SAMPLE_BYTES);
            if (nul == 0 || nul < UTF16_NUL_SHARE * n || Math.max(nuls[0], nuls[1]) < UTF16_PARITY_SHARE * nul) {
                return b;
            }
            // ASCII text as UTF-16: the high byte is the NUL, first in big-endian order
            charset = nuls[0] > nuls[1] ? StandardCharsets.UTF_16BE : StandardCharsets.UTF_16LE;
        }
        String text = new String(b, skip, (b.length - skip) & ~1, charset);
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /** NUL bytes at even and at odd offsets among the first {@value #SAMPLE_BYTES} bytes. */
    private static int[] nulsByParity(byte[] b) {
        int n = Math.min(b.length, SAMPLE_BYTES);
        int[] nuls = new int[2];
        for (int i = 0; i < n; i++) {
            if (b[i] == 0) {
                nuls[i & 1]++;
            }
        }
        return nuls;
    }

    /**
     * Throws when the bytes are not plain text: NULs or many control bytes in the first
     * {@value #SAMPLE_BYTES} bytes. UTF-16 text is turned into UTF-8 by {@link #asUtf8} before.
     */
    static void requireText(byte[] b, String file) throws InputException {
        int n = Math.min(b.length, SAMPLE_BYTES);
        int nul = 0;
        int control = 0;
        for (int i = 0; i < n; i++) {
            int v = b[i] & 0xFF;
            if (v == 0) {
                nul++;
            } else if (v < 0x20 && v != '\t' && v != '\n' && v != '\r' && v != '\f') {
                control++;
            }
        }
        if (nul > 0) {
            throw new InputException(file, 0, null, "not a text file (it contains NUL bytes)");
        }
        if (control > BINARY_CONTROL_SHARE * n) {
            throw new InputException(file, 0, null, "not a text file (it contains many control bytes)");
        }
    }
}
