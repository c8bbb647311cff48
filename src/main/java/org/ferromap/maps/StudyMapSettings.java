package org.ferromap.maps;

import java.util.EnumSet;
import java.util.Objects;
import java.util.Set;
import org.ferromap.balance.BalanceSettings;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * What a study map computes and how. Immutable; change with the {@code withX} copies.
 *
 * @param layers          the layers asked for; the balance grid is computed whenever a layer
 *                        other than {@code time} is asked for. Default balance, peak, folds
 * @param ensemble        the switching events of the time-domain layer; default
 *                        {@link EnsembleSettings#defaults()}
 * @param balance         settings of the single-harmonic balance; default {@link BalanceSettings#DEFAULTS}
 * @param refine          whether to refine adaptively from a coarse lattice (stride 8) instead
 *                        of computing every cell; default true. Categories are compared exactly;
 *                        the balance peak within {@value #PEAK_TOLERANCE_PU} pu when the peak layer is
 *                        asked for; the time-domain shares and worst mode exactly (its peak is ignored).
 *                        A feature thinner than 8 cells between agreeing corners can be missed.
 * @param balanceTileSize tile side of the balance layer, cells; default 16
 * @param timeTileSize    tile side of the time-domain layer, cells; default 4 (a tile of slow
 *                        cells is the most Ctrl-C loses)
 */
public record StudyMapSettings(Set<MapLayer> layers, EnsembleSettings ensemble, BalanceSettings balance, boolean refine,
        int balanceTileSize, int timeTileSize) {

    /** Largest peak difference, pu, at which refinement still lets two balance cells agree. */
    public static final double PEAK_TOLERANCE_PU = 0.005;

    public StudyMapSettings {
        Objects.requireNonNull(ensemble, "ensemble");
        Objects.requireNonNull(balance, "balance");
        if (layers == null || layers.isEmpty()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "a map needs at least one layer");
        }
        layers = Set.copyOf(layers);
        for (int t : new int[] {balanceTileSize, timeTileSize}) {
            if (t < 1 || t > 1024) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "tile size " + t + " cells; allowed 1 to 1024");
            }
        }
    }

    /** Balance, peak and folds; refinement on; default ensemble and tiles. */
    public static StudyMapSettings defaults() {
        return new StudyMapSettings(EnumSet.of(MapLayer.BALANCE, MapLayer.PEAK, MapLayer.FOLDS), EnsembleSettings.defaults(),
                BalanceSettings.DEFAULTS, true, 16, 4);
    }

    public StudyMapSettings withLayers(Set<MapLayer> l) {
        return new StudyMapSettings(l, ensemble, balance, refine, balanceTileSize, timeTileSize);
    }

    public StudyMapSettings withEnsemble(EnsembleSettings e) {
        return new StudyMapSettings(layers, e, balance, refine, balanceTileSize, timeTileSize);
    }

    public StudyMapSettings withBalance(BalanceSettings b) {
        return new StudyMapSettings(layers, ensemble, b, refine, balanceTileSize, timeTileSize);
    }

    public StudyMapSettings withRefine(boolean on) {
        return new StudyMapSettings(layers, ensemble, balance, on, balanceTileSize, timeTileSize);
    }

    public StudyMapSettings withTileSizes(int balanceTiles, int timeTiles) {
        return new StudyMapSettings(layers, ensemble, balance, refine, balanceTiles, timeTiles);
    }

    /** Whether the balance grid is needed. */
    public boolean needsBalance() {
        return layers.stream().anyMatch(MapLayer::needsBalance);
    }

    /** Whether a layer was asked for. */
    public boolean has(MapLayer l) {
        return layers.contains(l);
    }

    /** Refinement of the balance layer (OFF when refinement is off). */
    public RefinementSettings balanceRefinement() {
        return refine ? RefinementSettings.DEFAULT.withTolerances(0, has(MapLayer.PEAK) ? PEAK_TOLERANCE_PU
                : Double.POSITIVE_INFINITY) : RefinementSettings.OFF;
    }

    /** Refinement of the time-domain layer (OFF when refinement is off). */
    public RefinementSettings timeRefinement() {
        return refine ? RefinementSettings.DEFAULT.withTolerances(0, 0, 0, Double.POSITIVE_INFINITY) : RefinementSettings.OFF;
    }
}
