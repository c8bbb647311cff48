package org.ferromap.maps;

import org.junit.jupiter.api.Nested;

class LocalPoolExecutorTest {

    @Nested
    class OneThread extends CellExecutorContract {
        @Override
        CellExecutor create() {
            return new LocalPoolExecutor(1, false, LocalPoolExecutor.DEFAULT_STOP_GRACE);
        }
    }

    @Nested
    class ThreeThreads extends CellExecutorContract {
        @Override
        CellExecutor create() {
            return new LocalPoolExecutor(3, true, LocalPoolExecutor.DEFAULT_STOP_GRACE);
        }
    }
}
