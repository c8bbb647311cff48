package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class MapRunnerTest {

    /** x from -1 to 1 with 129 steps: x = 0 is column 64, a coarse lattice column for stride 8. */
    static final MapRequest CUSP = MapRequest.of(Axis.linear("x", "", -1, 1, 129), Axis.linear("y", "", -0.3, 1.5, 97));

    static MapGrid run(MapRequest r, CellFunction f, int threads, RefinementSettings refine) {
        return MapRunner.run(r, f, new LocalPoolExecutor(threads, false, LocalPoolExecutor.DEFAULT_STOP_GRACE), null,
                null, refine);
    }

    /**
     * Each cell is written to its own slots by a pure function, so the thread count cannot change
     * a single bit [der: disjoint writes, no reduction]. Checked with and without refinement, and
     * with another tile size (which changes the work division only).
     */
    @Test
    void resultIsBitIdenticalWhateverTheThreadCount() {
        CellFunction f = new TestCells.Cubic();
        MapGrid one = run(CUSP, f, 1, RefinementSettings.OFF);
        MapGrid two = run(CUSP, f, 2, RefinementSettings.OFF);
        MapGrid small = run(CUSP.withTileSize(5), f, 2, RefinementSettings.OFF);
        assertTrue(one.sameAs(two));
        assertTrue(one.sameAs(small));
        RefinementSettings r = RefinementSettings.DEFAULT.withTolerances(0, 0.05);
        MapGrid rOne = run(CUSP, f, 1, r);
        MapGrid rTwo = run(CUSP, f, 2, r);
        MapGrid rSmall = run(CUSP.withTileSize(7), f, 2, r);
        assertTrue(rOne.sameAs(rTwo));
        assertTrue(rOne.sameAs(rSmall));
        assertEquals(rOne.stats().computed(), rTwo.stats().computed());
    }

    /** Cell (ix, iy) holds f(x_ix, y_iy) in row-major order [der: the layout contract]. */
    @Test
    void cellsSitWhereTheAxesSay() {
        CellFunction f = new TestCells.Cubic();
        MapGrid g = run(CUSP, f, 2, RefinementSettings.OFF);
        double[] out = new double[2];
        for (int iy = 0; iy < g.ny(); iy += 7) {
            for (int ix = 0; ix < g.nx(); ix += 5) {
                f.evaluate(CUSP.x().value(ix), CUSP.y().value(iy), out, 0);
                assertEquals(out[0], g.value(ix, iy, 0), 0.0);
                assertEquals(out[1], g.value(ix, iy, 1), 0.0);
                assertEquals(out[1], g.layer(1)[iy * g.nx() + ix], 0.0);
                assertEquals(out[1], g.layerRows(1)[iy][ix], 0.0);
            }
        }
        assertEquals(0, g.inferredCount());
        assertEquals(CUSP.cells(), g.stats().computed());
    }

    /**
     * The three-root region of t^3 - y t - x is bounded by x = +-(4 y^3 / 27)^(1/2) [der: cubic
     * discriminant], monotone in y on each side, and the column x = 0 (inside it for y > 0) lies on
     * the coarse lattice. So no agreeing block can hide part of the region, and refinement must
     * reproduce the full grid's categories exactly while computing fewer cells.
     */
    @Test
    void refinementReproducesLargeRegionsExactlyWithFewerCells() {
        TestCells.Counting full = new TestCells.Counting(new TestCells.Cubic());
        TestCells.Counting refined = new TestCells.Counting(new TestCells.Cubic());
        MapGrid a = run(CUSP, full, 2, RefinementSettings.OFF);
        // category exact, the root value ignored: only the category decides
        MapGrid b = run(CUSP, refined, 2, RefinementSettings.DEFAULT.withTolerances(0, Double.POSITIVE_INFINITY));
        assertArrayEquals(a.layer(0), b.layer(0), 0.0);
        assertEquals(CUSP.cells(), full.count.get());
        assertEquals(b.stats().computed(), refined.count.get());
        assertTrue(refined.count.get() < CUSP.cells() / 2,
                "refinement computed " + refined.count.get() + " of " + CUSP.cells());
        assertEquals(CUSP.cells(), b.stats().computed() + b.stats().inferred());
        assertEquals(b.stats().inferred(), b.inferredCount());
        // computed cells are the function's values; inferred ones copy the nearest computed corner
        for (int iy = 0; iy < b.ny(); iy++) {
            for (int ix = 0; ix < b.nx(); ix++) {
                if (!b.isInferred(ix, iy)) {
                    assertEquals(a.value(ix, iy, 1), b.value(ix, iy, 1), 0.0);
                } else {
                    assertTrue(isSomeComputedValue(b, b.value(ix, iy, 1)));
                }
            }
        }
    }

    private static boolean isSomeComputedValue(MapGrid g, double v) {
        for (int c = 0; c < g.flags().length; c++) {
            if (g.flags()[c] == MapGrid.COMPUTED && g.data()[c * g.width() + 1] == v) {
                return true;
            }
        }
        return false;
    }

    /**
     * The documented risk: a stripe one column wide placed strictly between coarse lattice
     * columns, with every lattice cell outside it, is missed by refinement; refinement off finds
     * it. [der: the stripe never touches a block corner]
     */
    @Test
    void aFeatureThinnerThanABlockIsMissedUnlessRefinementIsOff() {
        MapRequest r = MapRequest.of(Axis.linear("x", "", 0, 32, 33), Axis.linear("y", "", 0, 32, 33));
        CellFunction stripe = new CellFunction() {
            @Override
            public int width() {
                return 1;
            }

            @Override
            public void evaluate(double x, double y, double[] out, int offset) {
                out[offset] = (x > 10.5 && x < 11.5) ? 1 : 0;
            }

            @Override
            public String fingerprint() {
                return "stripe at x = 11";
            }
        };
        MapGrid coarse = run(r, stripe, 2, RefinementSettings.DEFAULT);
        MapGrid all = run(r, stripe, 2, RefinementSettings.OFF);
        assertEquals(0, Boundaries.edges(coarse, 0).size(), "refinement cannot see the stripe");
        assertEquals(2 * 33, Boundaries.edges(all, 0).size(), "both sides of the stripe, every row");
    }

    /** With the default exact comparison, a smooth value never agrees and every cell is computed [der]. */
    @Test
    void exactComparisonOnSmoothValuesComputesEverything() {
        MapRequest r = MapRequest.of(Axis.linear("x", "", 0, 1, 40), Axis.linear("y", "", 0, 1, 33));
        TestCells.Counting f = new TestCells.Counting(new TestCells.Smooth(1));
        MapGrid g = run(r, f, 2, RefinementSettings.DEFAULT);
        assertEquals(r.cells(), f.count.get(), "no cell twice, none skipped");
        assertEquals(0, g.inferredCount());
        assertTrue(g.sameAs(run(r, new TestCells.Smooth(1), 1, RefinementSettings.OFF)));
    }

    /** Settings that cannot work are refused before any cell is computed [cp]. */
    @Test
    void inconsistentSettingsAreRefused() {
        TestCells.Counting f = new TestCells.Counting(new TestCells.Cubic());
        FerromapException e = assertThrows(FerromapException.class,
                () -> run(CUSP, f, 1, RefinementSettings.DEFAULT.withTolerances(0)));
        assertEquals(MessageKey.BAD_REQUEST, e.key());
        assertEquals(0, f.count.get());
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(FerromapException.class,
                () -> RefinementSettings.DEFAULT.withCoarseStride(6)).key());
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(FerromapException.class,
                () -> RefinementSettings.DEFAULT.withTolerances(0, -1)).key());
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(FerromapException.class,
                () -> CUSP.withTileSize(0)).key());
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(FerromapException.class,
                () -> new LocalPoolExecutor(0)).key());
    }

    /** A cell that throws stops the map with its own exception, not a wrapped one [cp]. */
    @Test
    void aFailingCellStopsTheMapWithItsException() {
        CellFunction bad = new CellFunction() {
            @Override
            public int width() {
                return 1;
            }

            @Override
            public void evaluate(double x, double y, double[] out, int offset) {
                if (x > 0.5) {
                    throw new FerromapException(MessageKey.NO_CONVERGENCE, "cell at x = " + x);
                }
                out[offset] = x;
            }

            @Override
            public String fingerprint() {
                return "fails right of 0.5";
            }
        };
        FerromapException e = assertThrows(FerromapException.class, () -> run(CUSP, bad, 2, RefinementSettings.OFF));
        assertEquals(MessageKey.NO_CONVERGENCE, e.key());
    }
}
