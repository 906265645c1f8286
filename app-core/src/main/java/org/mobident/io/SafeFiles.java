package org.mobident.io;

import java.io.BufferedOutputStream;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.Objects;
import java.util.concurrent.ThreadLocalRandom;

/**
 * The one way Mobident writes files: never half a file, never a silent overwrite.
 *
 * <p>Every write goes to a temporary file in the target's own folder (so the final rename stays
 * on one file system), is flushed and forced to the storage device, and only then moved over
 * the target with {@link StandardCopyOption#ATOMIC_MOVE}. Where the file system cannot rename
 * atomically, the move falls back to {@link StandardCopyOption#REPLACE_EXISTING}. If anything
 * fails before the move, including an exception thrown by the caller's writer, the temporary
 * file is deleted and the target is left exactly as it was.
 *
 * <p>An existing target is replaced only when the caller says so; otherwise the call fails
 * before any work is done with a {@link FileAlreadyExistsException} whose reason names how to
 * allow it (the caller supplies the wording, e.g. the name of its command-line option).
 *
 * <p>The parent folder must exist; it is not created here.
 *
 * <p>Text is always written as UTF-8.
 */
public final class SafeFiles {

    /** Suffix of the copy of the previous version kept by {@link #writeKeepingPrevious}. */
    public static final String PREVIOUS_SUFFIX = ".prev";

    /** Reason used when the caller does not name its own way of allowing an overwrite. */
    public static final String NEUTRAL_OVERWRITE_HINT = "allow overwriting to replace it";

    private static final String TEMP_SUFFIX = ".tmp";

    private static final int BUFFER_BYTES = 1 << 16;

    /** How many random temporary names to try before giving up (a clash is already unlikely). */
    private static final int TEMP_NAME_ATTEMPTS = 5;

    /** Writes text content to a {@link Writer}; the writer is closed by {@link SafeFiles}. */
    @FunctionalInterface
    public interface ContentWriter {
        void write(Writer out) throws IOException;
    }

    /** Writes binary content to an {@link OutputStream}; the stream is closed by {@link SafeFiles}. */
    @FunctionalInterface
    public interface ByteWriter {
        void write(OutputStream out) throws IOException;
    }

    private SafeFiles() {
    }

    /**
     * Writes UTF-8 text to {@code target} atomically.
     *
     * @param target    the file to create or replace
     * @param overwrite whether an existing {@code target} may be replaced
     * @param writer    produces the content
     * @throws FileAlreadyExistsException if {@code target} exists and {@code overwrite} is false
     *                                    (thrown before the writer is called)
     * @throws IOException                if writing or moving fails; the target is then untouched
     */
    public static void write(Path target, boolean overwrite, ContentWriter writer) throws IOException {
        write(target, overwrite, NEUTRAL_OVERWRITE_HINT, writer);
    }

    /**
     * As {@link #write(Path, boolean, ContentWriter)}, with the caller's wording of how to allow
     * an overwrite, e.g. {@code "use --overwrite to replace it"}.
     */
    public static void write(Path target, boolean overwrite, String overwriteHint, ContentWriter writer)
            throws IOException {
        Objects.requireNonNull(writer, "writer");
        writeBytes(target, overwrite, overwriteHint, textToBytes(writer));
    }

    /** Writes binary content to {@code target} atomically; see {@link #write(Path, boolean, ContentWriter)}. */
    public static void writeBytes(Path target, boolean overwrite, ByteWriter writer) throws IOException {
        writeBytes(target, overwrite, NEUTRAL_OVERWRITE_HINT, writer);
    }

    /** Writes binary content to {@code target} atomically, with the caller's overwrite wording. */
    public static void writeBytes(Path target, boolean overwrite, String overwriteHint, ByteWriter writer)
            throws IOException {
        Objects.requireNonNull(writer, "writer");
        Path absolute = target.toAbsolutePath();
        if (!overwrite && Files.exists(absolute)) {
            throw new FileAlreadyExistsException(target.toString(), null,
                    "exists; " + (overwriteHint == null ? NEUTRAL_OVERWRITE_HINT : overwriteHint));
        }
        Path temp = writeTemp(absolute, writer);
        try {
            moveIntoPlace(temp, absolute);
        } finally {
            Files.deleteIfExists(temp);
        }
        syncFolder(absolute.getParent());
    }

    /**
     * Writes UTF-8 text to {@code target} atomically, always allowed to replace it, and keeps the
     * version it replaces as {@code <name>.prev} beside it (an older {@code .prev} is replaced).
     * Meant for files a user edits or builds up over time, such as mobility libraries.
     *
     * <p>Order of events: the new content is written to a temporary file and forced to disk; the
     * current target is copied to a second temporary file which is then renamed to
     * {@code <name>.prev}; finally the new content is renamed over the target. The target is
     * therefore never missing, and if anything fails before the last rename it keeps its old
     * content.
     *
     * @return the path of the kept previous version, or {@code null} when there was none
     */
    public static Path writeKeepingPrevious(Path target, ContentWriter writer) throws IOException {
        Objects.requireNonNull(writer, "writer");
        Path absolute = target.toAbsolutePath();
        if (Files.isDirectory(absolute)) {
            // checked first: a folder would otherwise be "kept" as an empty <name>.prev folder
            throw new FileSystemException(target.toString(), null, "is a folder, not a file");
        }
        Path temp = writeTemp(absolute, textToBytes(writer));
        Path kept = null;
        try {
            if (Files.exists(absolute)) {
                kept = previousOf(absolute);
                Path prevTemp = newTempPath(absolute, PREVIOUS_SUFFIX);
                try {
                    Files.copy(absolute, prevTemp, StandardCopyOption.REPLACE_EXISTING,
                            StandardCopyOption.COPY_ATTRIBUTES);
                    moveIntoPlace(prevTemp, kept);
                } finally {
                    Files.deleteIfExists(prevTemp);
                }
            }
            moveIntoPlace(temp, absolute);
        } finally {
            Files.deleteIfExists(temp);
        }
        syncFolder(absolute.getParent());
        return kept;
    }

    /** Where {@link #writeKeepingPrevious} keeps the previous version of {@code target}. */
    public static Path previousOf(Path target) {
        return target.resolveSibling(target.getFileName().toString() + PREVIOUS_SUFFIX);
    }

    private static ByteWriter textToBytes(ContentWriter writer) {
        return out -> {
            Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
            writer.write(w);
            w.flush();
        };
    }

    /** Writes the content to a new temporary file beside {@code target}, forced to disk. */
    private static Path writeTemp(Path target, ByteWriter writer) throws IOException {
        Path folder = target.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw new NoSuchFileException(target.toString(), null, "folder does not exist");
        }
        Path temp = newTempPath(target, "");
        FileChannel opened = null;
        for (int attempt = 1; opened == null; attempt++) {
            try {
                // CREATE_NEW without explicit attributes: the file gets the platform's default
                // permissions (umask), unlike Files.createTempFile, which makes it owner-only.
                opened = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.CREATE_NEW);
            } catch (FileAlreadyExistsException e) {
                if (attempt >= TEMP_NAME_ATTEMPTS) {
                    throw e;
                }
                temp = newTempPath(target, "");
            }
        }
        copyPermissionsIfPresent(target, temp);
        boolean done = false;
        try (FileChannel channel = opened) {
            OutputStream raw = Channels.newOutputStream(channel);
            OutputStream guarded = new NonClosingStream(new BufferedOutputStream(raw, BUFFER_BYTES));
            writer.write(guarded);
            guarded.flush();
            channel.force(true);
            done = true;
        } finally {
            if (!done) {
                Files.deleteIfExists(temp);
            }
        }
        return temp;
    }

    /** A fresh hidden name beside {@code target}: {@code .<name><infix>.<random>.tmp}. */
    private static Path newTempPath(Path target, String infix) {
        String random = Long.toHexString(ThreadLocalRandom.current().nextLong());
        return target.resolveSibling("." + target.getFileName() + infix + "." + random + TEMP_SUFFIX);
    }

    /** Gives a replacement the permissions of the file it replaces (POSIX systems only). */
    private static void copyPermissionsIfPresent(Path target, Path temp) throws IOException {
        if (Files.exists(target) && Files.getFileStore(temp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            Files.setPosixFilePermissions(temp, Files.getPosixFilePermissions(target));
        }
    }

    private static void moveIntoPlace(Path source, Path target) throws IOException {
        try {
            Files.move(source, target, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(source, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Forces the folder entry of a rename to disk where the platform allows opening a folder
     * (POSIX). Elsewhere this is not possible and the rename is as durable as the platform makes it.
     */
    private static void syncFolder(Path folder) {
        if (folder == null) {
            return;
        }
        try (FileChannel dir = FileChannel.open(folder, StandardOpenOption.READ)) {
            dir.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // Best effort only: the content itself was already forced before the rename, and a
            // platform that cannot open folders (Windows) offers no folder sync to ask for.
            return;
        }
    }

    /** Lets caller code close "its" stream without closing the channel before it is forced. */
    private static final class NonClosingStream extends OutputStream {
        private final OutputStream delegate;

        NonClosingStream(OutputStream delegate) {
            this.delegate = delegate;
        }

        @Override
        public void write(int b) throws IOException {
            delegate.write(b);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            delegate.write(b, off, len);
        }

        @Override
        public void flush() throws IOException {
            delegate.flush();
        }

        @Override
        public void close() throws IOException {
            delegate.flush();
        }
    }
}
