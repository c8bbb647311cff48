package org.ferromap.maps;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import java.util.zip.CRC32;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Finished work units saved to disk so an interrupted map resumes where it stopped. One file per
 * unit, {@code <root>/<first 16 hex digits of the run key>/tile-p<pass>-<tileX>-<tileY>.bin}, written
 * to a temporary file and renamed into place, so a file is either whole or absent.
 *
 * <p>A file is reused only when everything in it matches the unit asked for: magic, format
 * version, the full run key (hash of the cell fingerprint, the axes and the work division), the
 * pass, the tile bounds, the grid width, the number of components, the exact cell list, and a CRC-32
 * of the whole file. Anything else (another study, a truncated or damaged file) is ignored, counted
 * in {@link #rejectedCount()}, and the unit is computed again and the file overwritten.
 *
 * <p>Keep the root out of a staging folder that an aborted run discards; {@link #forOutput} puts it
 * in the final output folder. Thread-safe: distinct units go to distinct files. Two processes
 * computing the same map into the same store at once are not coordinated (each file stays whole,
 * the work is done twice).
 */
public final class TileStore {

    /** "FMTL": ferromap tile. */
    private static final int MAGIC = 0x464D544C;
    private static final int VERSION = 1;
    private static final int KEY_BYTES = 32;
    private static final int FIXED_HEADER = 4 + 4 + KEY_BYTES + 10 * 4 + 1;

    private final Path root;
    private final AtomicInteger rejected = new AtomicInteger();

    private TileStore(Path root) {
        this.root = root;
    }

    /** A store under {@code root} (created on first use). */
    public static TileStore at(Path root) {
        return new TileStore(root.toAbsolutePath().normalize());
    }

    /**
     * The store of a command writing its results to the output folder {@code out}:
     * {@code <out>/.map-tiles}. With {@code report.OutputFolder}, which stages new results beside
     * {@code out} and swaps them in only at commit, the tiles of an interrupted run stay in the old
     * {@code out} until a rerun completes, and vanish with it at that commit: resume data lives
     * exactly as long as it is useful.
     */
    public static TileStore forOutput(Path out) {
        return at(out.resolve(".map-tiles"));
    }

    /** The folder holding one folder per run key. */
    public Path root() {
        return root;
    }

    /** The folder of one run (a 64-hex-digit run key from {@link MapRunner#runKey}). */
    public Path folder(String runKey) {
        checkKey(runKey);
        return root.resolve(runKey.substring(0, 16));
    }

    /** Where the unit's tile lives. */
    public Path file(String runKey, WorkUnit u) {
        return folder(runKey).resolve("tile-p" + u.pass() + "-" + u.tileX() + "-" + u.tileY() + ".bin");
    }

    /** Creates the run's folder; {@code CANNOT_WRITE} when it cannot be. Call before computing. */
    public void prepare(String runKey) {
        Path dir = folder(runKey);
        try {
            Files.createDirectories(dir);
            if (!Files.isWritable(dir)) {
                throw new IOException("not writable");
            }
        } catch (IOException | SecurityException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot write map tiles (for resuming) under " + dir
                    + ": " + e.getMessage() + "; choose a writable output folder", e);
        }
    }

    /** Number of tile files found but not trusted (mismatched or damaged) since this store was made. */
    public int rejectedCount() {
        return rejected.get();
    }

    /**
     * Loads the unit's values into {@code into} (cell {@code k} at {@code k * width}) when a
     * matching, intact file exists; returns whether it did. A missing file is not a rejection.
     */
    public boolean load(String runKey, WorkUnit unit, int width, double[] into) {
        Path f = file(runKey, unit);
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(f);
        } catch (NoSuchFileException e) {
            return false;
        } catch (IOException e) {
            rejected.incrementAndGet();
            return false;
        }
        if (!decode(bytes, HexFormat.of().parseHex(runKey), unit, width, into)) {
            rejected.incrementAndGet();
            return false;
        }
        return true;
    }

    /** Saves a finished unit atomically; {@code CANNOT_WRITE} on failure. */
    public void save(String runKey, WorkUnit unit, int width, double[] values) {
        byte[] bytes = encode(HexFormat.of().parseHex(runKey), unit, width, values);
        Path target = file(runKey, unit);
        Path tmp = null;
        try {
            tmp = Files.createTempFile(target.getParent(), "tile-", ".part");
            Files.write(tmp, bytes);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException | SecurityException e) {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // a stray .part file is ignored by load and harmless
                }
            }
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot save map tile " + target + ": " + e.getMessage()
                    + "; free disk space or choose another output folder", e);
        }
    }

    /** Removes the run's tiles (e.g. once its map is written); missing tiles are fine. */
    public void delete(String runKey) {
        Path dir = folder(runKey);
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot remove map tiles under " + dir + ": "
                    + e.getMessage(), e);
        }
    }

    static byte[] encode(byte[] key, WorkUnit u, int width, double[] values) {
        int count = u.cellCount();
        boolean listed = u.cells() != null;
        int size = FIXED_HEADER + (listed ? 4 * count : 0) + 8 * count * width + 8;
        ByteBuffer b = ByteBuffer.allocate(size);
        b.putInt(MAGIC).putInt(VERSION).put(key);
        b.putInt(u.pass()).putInt(u.tileX()).putInt(u.tileY());
        b.putInt(u.ix0()).putInt(u.iy0()).putInt(u.ix1()).putInt(u.iy1()).putInt(u.nx());
        b.putInt(width).putInt(count).put((byte) (listed ? 1 : 0));
        if (listed) {
            for (int c : u.cells()) {
                b.putInt(c);
            }
        }
        for (int i = 0; i < count * width; i++) {
            b.putLong(Double.doubleToRawLongBits(values[i]));
        }
        CRC32 crc = new CRC32();
        crc.update(b.array(), 0, size - 8);
        b.putLong(crc.getValue());
        return b.array();
    }

    static boolean decode(byte[] bytes, byte[] key, WorkUnit u, int width, double[] into) {
        int count = u.cellCount();
        boolean listed = u.cells() != null;
        int size = FIXED_HEADER + (listed ? 4 * count : 0) + 8 * count * width + 8;
        if (bytes.length != size) {
            return false;
        }
        CRC32 crc = new CRC32();
        crc.update(bytes, 0, size - 8);
        ByteBuffer b = ByteBuffer.wrap(bytes);
        if (b.getLong(size - 8) != crc.getValue()) {
            return false;
        }
        if (b.getInt() != MAGIC || b.getInt() != VERSION) {
            return false;
        }
        for (int i = 0; i < KEY_BYTES; i++) {
            if (b.get() != key[i]) {
                return false;
            }
        }
        if (b.getInt() != u.pass() || b.getInt() != u.tileX() || b.getInt() != u.tileY()
                || b.getInt() != u.ix0() || b.getInt() != u.iy0() || b.getInt() != u.ix1() || b.getInt() != u.iy1()
                || b.getInt() != u.nx() || b.getInt() != width || b.getInt() != count
                || b.get() != (byte) (listed ? 1 : 0)) {
            return false;
        }
        if (listed) {
            for (int c : u.cells()) {
                if (b.getInt() != c) {
                    return false;
                }
            }
        }
        for (int i = 0; i < count * width; i++) {
            into[i] = Double.longBitsToDouble(b.getLong());
        }
        return true;
    }

    private static void checkKey(String runKey) {
        if (runKey == null || runKey.length() != 2 * KEY_BYTES) {
            throw new IllegalArgumentException("a run key is 64 hex digits, got " + runKey);
        }
    }
}
