package org.ferromap.cli.run;

import java.io.IOException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.ferromap.maps.StudyMap;
import org.ferromap.maps.StudyMapResult;
import org.ferromap.maps.TileStore;

/**
 * Where a study's map tiles wait for a resume: {@code <out>/.tiles/<study>}, outside the atomic
 * output folders (whose staging copy an interrupted run discards), shared by {@code map} and
 * {@code run} so either resumes the other's interrupted map.
 */
public final class ResumeTiles {

    private ResumeTiles() {
    }

    /** The store of a study's maps under the output root. */
    public static TileStore store(Path outRoot, String studyName) {
        return TileStore.at(outRoot.resolve(".tiles").resolve(studyName));
    }

    /** Deletes a finished map's tiles, then the study's and the root tile folders when they are left empty. */
    public static void forget(TileStore store, StudyMapResult r) {
        StudyMap.forgetTiles(store, r);
        Path root = store.root();
        for (Path p : new Path[] {root, root.getParent()}) {
            try {
                Files.deleteIfExists(p);
            } catch (DirectoryNotEmptyException e) {
                return; // other maps' tiles are waiting there
            } catch (IOException e) {
                return; // leftover empty folders are harmless
            }
        }
    }
}
