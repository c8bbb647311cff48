package org.ferromap.maps;

/** A 1000 x 1000 map of 4 cheap values, run in a child JVM with a small heap by {@link MemoryTest}. */
public final class LargeMapMain {

    private LargeMapMain() {
    }

    static MapGrid compute(RefinementSettings refine) {
        MapRequest r = MapRequest.of(Axis.linear("x", "", 0, 10, 1000), Axis.linear("y", "", 0, 10, 1000));
        CellFunction cheap = new CellFunction() {
            @Override
            public int width() {
                return 4;
            }

            @Override
            public void evaluate(double x, double y, double[] out, int offset) {
                out[offset] = (x * x + y * y < 25) ? 1 : 0; // a category with a large round region
                out[offset + 1] = x + y;
                out[offset + 2] = x * y;
                out[offset + 3] = x - y;
            }

            @Override
            public String fingerprint() {
                return "cheap disc";
            }
        };
        return MapRunner.run(r, cheap, new LocalPoolExecutor(2), null, null, refine);
    }

    public static void main(String[] args) {
        MapGrid off = compute(RefinementSettings.OFF);
        System.out.println("off: " + (off.stats().computed() + off.stats().inferred()) + " cells resolved");
        off = null;
        MapGrid on = compute(RefinementSettings.DEFAULT.withTolerances(0, 1, 1, 1));
        System.out.println("on: " + (on.stats().computed() + on.stats().inferred()) + " cells resolved, "
                + on.stats().computed() + " computed");
        System.out.println("max heap " + Runtime.getRuntime().maxMemory());
    }
}
