package org.ferromap.report;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.stream.Stream;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * An output folder written all-or-nothing: files go to a hidden temporary sibling, and
 * {@link #commit()} swaps it into place by rename. An interrupted run leaves the previous
 * complete folder (or nothing), never a half-written one. Not thread-safe; one per run.
 */
public final class OutputFolder implements AutoCloseable {

    private final Path target;
    private final Path staging;
    private boolean committed;

    private OutputFolder(Path target, Path staging) {
        this.target = target;
        this.staging = staging;
    }

    /**
     * Opens a staging folder for {@code target}. Fails with {@link MessageKey#CANNOT_WRITE} when
     * the parent cannot be created or written.
     */
    public static OutputFolder open(Path target) {
        Path abs = target.toAbsolutePath().normalize();
        Path parent = abs.getParent();
        try {
            Files.createDirectories(parent);
            Path staging = Files.createTempDirectory(parent, "." + abs.getFileName() + ".partial-");
            return new OutputFolder(abs, staging);
        } catch (IOException | SecurityException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE,
                    "cannot write the output folder " + abs + ": " + reason(e)
                            + "; choose a writable folder (--out)", e);
        }
    }

    /** Where files are written until {@link #commit()}. */
    public Path staging() {
        return staging;
    }

    /** Where the folder will be once committed. */
    public Path target() {
        return target;
    }

    /** A path inside the staging folder. */
    public Path file(String name) {
        return staging.resolve(name);
    }

    /** Moves the staged folder into place, replacing an earlier complete folder of the same name. */
    public Path commit() {
        try {
            Path old = null;
            if (Files.exists(target)) {
                old = target.resolveSibling("." + target.getFileName() + ".old-" + System.nanoTime());
                move(target, old);
            }
            move(staging, target);
            committed = true;
            if (old != null) {
                deleteTree(old);
            }
            return target;
        } catch (IOException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE,
                    "cannot move the finished output into " + target + ": " + reason(e), e);
        }
    }

    /** Discards the staging folder unless committed. */
    @Override
    public void close() {
        if (!committed) {
            try {
                deleteTree(staging);
            } catch (IOException ignored) {
                // best effort: a leftover hidden .partial folder is harmless and says what it is
            }
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException | FileAlreadyExistsException e) {
            Files.move(from, to);
        }
    }

    static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }

    private static String reason(Exception e) {
        String m = e.getMessage();
        return e.getClass().getSimpleName().replace("Exception", "") + (m == null ? "" : " (" + m + ")");
    }
}
