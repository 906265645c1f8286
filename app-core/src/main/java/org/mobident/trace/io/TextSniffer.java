package org.mobident.trace.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

import org.mobident.InputException;

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
     * The text as UTF-8 bytes: UTF-16 text (a byte order mark, or NULs at every other byte of the
     * first {@value #SAMPLE_BYTES} bytes, as Windows programs write "Unicode" text) re-encoded,
     * anything else returned as it is. Line ends and line numbers are kept.
     */
    static byte[] asUtf8(byte[] b) {
        boolean bigEndianMark = b.length >= 2 && (b[0] & 0xFF) == 0xFE && (b[1] & 0xFF) == 0xFF;
        boolean littleEndianMark = b.length >= 2 && (b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE;
        java.nio.charset.Charset charset;
        int skip = 0;
        if (bigEndianMark || littleEndianMark) {
            charset = bigEndianMark ? StandardCharsets.UTF_16BE : StandardCharsets.UTF_16LE;
            skip = 2;
        } else {
            int n = Math.min(b.length, SAMPLE_BYTES);
            int nulEven = 0;
            int nulOdd = 0;
            for (int i = 0; i < n; i++) {
                if (b[i] == 0) {
                    if ((i & 1) == 0) {
                        nulEven++;
                    } else {
                        nulOdd++;
                    }
                }
            }
            int nul = nulEven + nulOdd;
            if (nul == 0 || nul < UTF16_NUL_SHARE * n || Math.max(nulEven, nulOdd) < UTF16_PARITY_SHARE * nul) {
                return b;
            }
            // ASCII text as UTF-16: the high byte is the NUL, first in big-endian order
            charset = nulEven > nulOdd ? StandardCharsets.UTF_16BE : StandardCharsets.UTF_16LE;
        }
        String text = new String(b, skip, (b.length - skip) & ~1, charset);
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /**
     * Throws when the bytes are UTF-16 (byte order mark, or NULs in every other byte) or binary
     * (NULs or many control bytes in the first {@value #SAMPLE_BYTES} bytes). Callers that read
     * UTF-16 pass the bytes through {@link #asUtf8} first.
     */
    static void requireText(byte[] b, String file) throws InputException {
        if (b.length >= 2 && (((b[0] & 0xFF) == 0xFE && (b[1] & 0xFF) == 0xFF)
                || ((b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE))) {
            throw new InputException(file, 0, null, "looks like UTF-16 text; save it as UTF-8");
        }
        int n = Math.min(b.length, SAMPLE_BYTES);
        int nulEven = 0;
        int nulOdd = 0;
        int control = 0;
        for (int i = 0; i < n; i++) {
            int v = b[i] & 0xFF;
            if (v == 0) {
                if ((i & 1) == 0) {
                    nulEven++;
                } else {
                    nulOdd++;
                }
            } else if (v < 0x20 && v != '\t' && v != '\n' && v != '\r' && v != '\f') {
                control++;
            }
        }
        int nul = nulEven + nulOdd;
        if (nul > 0) {
            if (nul >= UTF16_NUL_SHARE * n && Math.max(nulEven, nulOdd) >= UTF16_PARITY_SHARE * nul) {
                throw new InputException(file, 0, null, "looks like UTF-16 text; save it as UTF-8");
            }
            throw new InputException(file, 0, null, "not a text file (it contains NUL bytes)");
        }
        if (control > BINARY_CONTROL_SHARE * n) {
            throw new InputException(file, 0, null, "not a text file (it contains many control bytes)");
        }
    }
}
