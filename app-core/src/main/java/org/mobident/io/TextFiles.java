package org.mobident.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.mobident.InputException;

/** Reading the small text files of the tool (libraries, sheets, tables) strictly as UTF-8. */
public final class TextFiles {

    private TextFiles() {
    }

    /**
     * The whole file as text.
     *
     * @param file the file
     * @param what what the file is, for messages ("library file", "standards sheet")
     * @throws InputException when it cannot be read or is not valid UTF-8 (naming the file)
     */
    public static String readUtf8(Path file, String what) throws InputException {
        String label = file.toString();
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new InputException(label, 0, null, "cannot read the " + what + ": " + e.getMessage(), e);
        }
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes))
                    .toString();
        } catch (CharacterCodingException e) {
            throw new InputException(label, 0, null, "the " + what + " is not valid UTF-8 text", e);
        }
    }
}
