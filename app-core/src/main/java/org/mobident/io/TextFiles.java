package org.mobident.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.PushbackReader;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.mobident.InputException;

/**
 * Reading the tool's text files (libraries, sheets, tables, trace headers) as UTF-8: the one
 * place where a byte-order mark is recognised and stripped, and where bytes become text.
 */
public final class TextFiles {

    /** The minus sign of typeset text (U+2212), as tables copied from documents hold it; read as '-'. */
    public static final char UNICODE_MINUS = '\u2212';


    /** The byte-order mark as a character (U+FEFF), as it stands first in text decoded with it. */
    public static final char BYTE_ORDER_MARK = '\uFEFF';

    private TextFiles() {
    }

    /**
     * A file opened for reading as strict UTF-8, a leading byte-order mark skipped; a file that
     * opens with a UTF-16 byte-order mark ("Unicode" text as Windows programs save it) is read as
     * strict UTF-16 of that byte order instead. Bytes that do not decode make a later read throw a
     * {@link CharacterCodingException}.
     *
     * @param what what the file is, for messages ("peak table")
     * @throws InputException when the file cannot be opened (naming the file and why)
     */
    public static Reader openUtf8(Path file, String what) throws InputException {
        String label = file.toString();
        String prefix = "cannot read the " + what + ": ";
        InputStream in = null;
        try {
            if (Files.isDirectory(file)) {
                throw new InputException(label, 0, null, prefix + "is a folder, not a file");
            }
            in = new java.io.BufferedInputStream(Files.newInputStream(file));
            java.nio.charset.Charset charset = StandardCharsets.UTF_8;
            in.mark(2);
            java.nio.charset.Charset marked = utf16ByMark(in.read(), in.read());
            if (marked != null) {
                charset = marked; // the mark is read and gone
            } else {
                in.reset();
            }
            CharsetDecoder strict = charset.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT);
            return withoutBom(new BufferedReader(new InputStreamReader(in, strict)));
        } catch (NoSuchFileException e) {
            throw new InputException(label, 0, null, prefix + "file not found", e);
        } catch (AccessDeniedException e) {
            throw new InputException(label, 0, null, prefix + "access denied", e);
        } catch (CharacterCodingException e) {
            closeQuietly(in);
            throw new InputException(label, 0, null, "the " + what + " is not valid UTF-8 text", e);
        } catch (IOException e) {
            closeQuietly(in);
            throw new InputException(label, 0, null, prefix + e.getMessage(), e);
        }
    }

    /**
     * The UTF-16 byte order that a text's first two bytes mark (FF FE little-endian, FE FF
     * big-endian), or null when they are no such mark.
     *
     * @param first  the first byte, 0–255 (or −1 at the end)
     * @param second the second byte, likewise
     */
    public static java.nio.charset.Charset utf16ByMark(int first, int second) {
        if (first == 0xFF && second == 0xFE) {
            return StandardCharsets.UTF_16LE;
        }
        if (first == 0xFE && second == 0xFF) {
            return StandardCharsets.UTF_16BE;
        }
        return null;
    }

    private static void closeQuietly(InputStream in) {
        if (in == null) {
            return;
        }
        try {
            in.close();
        } catch (IOException e) {
            // already failing with the first error, which is the one to report
            return;
        }
    }

    /** Number of bytes of a UTF-8 byte-order mark at the start of {@code b}: 0 or 3. */
    public static int bomLength(byte[] b) {
        return b.length >= 3 && (b[0] & 0xFF) == 0xEF && (b[1] & 0xFF) == 0xBB && (b[2] & 0xFF) == 0xBF ? 3 : 0;
    }

    /** {@code text} without a leading byte-order mark. */
    public static String withoutBom(String text) {
        return !text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK ? text.substring(1) : text;
    }

    /** A reader that skips a leading byte-order mark of {@code in}. */
    public static Reader withoutBom(Reader in) throws IOException {
        PushbackReader r = new PushbackReader(in, 1);
        int first = r.read();
        if (first >= 0 && first != BYTE_ORDER_MARK) {
            r.unread(first);
        }
        return r;
    }

    /** {@code b[from, to)} as strict UTF-8 (malformed input is an error). */
    public static String decodeStrict(byte[] b, int from, int to) throws CharacterCodingException {
        CharBuffer cb = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT)
                .decode(ByteBuffer.wrap(b, from, to - from));
        return cb.toString();
    }

    /** {@code b[from, to)} as UTF-8, or as ISO-8859-1 when it is not valid UTF-8 (old exports). */
    public static String decodeLenient(byte[] b, int from, int to) {
        try {
            return decodeStrict(b, from, to);
        } catch (CharacterCodingException e) {
            return new String(b, from, to - from, StandardCharsets.ISO_8859_1);
        }
    }

    /** The most frequent of tab, semicolon, comma outside quotes (ties: that order), or 0 when none occurs. */
    public static char mostFrequentDelimiter(String header) {
        int tabs = 0;
        int semicolons = 0;
        int commas = 0;
        boolean quoted = false;
        for (int i = 0; i < header.length(); i++) {
            char c = header.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted) {
                if (c == '\t') {
                    tabs++;
                } else if (c == ';') {
                    semicolons++;
                } else if (c == ',') {
                    commas++;
                }
            }
        }
        if (tabs == 0 && semicolons == 0 && commas == 0) {
            return 0;
        }
        if (tabs >= semicolons && tabs >= commas) {
            return '\t';
        }
        return semicolons >= commas ? ';' : ',';
    }
}
