package org.ferromap.orbits;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class ScratchTest {
    @Test
    void mathieu() {
        Shooting sh = new Shooting(ShootingSettings.DEFAULTS.withTolerance(1e-13, 1e-10));
        BifurcationLocator loc = new BifurcationLocator(sh, a -> new MathieuSystem(a, 1.0), Section.periods(1), 1.0, 2, 1e-11);
        List<BifurcationLocator.Sample> s = new ArrayList<>();
        for (int i = 0; i <= 110; i++) {
            double a = -0.5 + 0.05 * i;
            s.add(loc.sample(new double[] {0, 0}, a, Double.NaN));
        }
        for (LocatedBifurcation b : loc.scan(s)) {
            System.out.println(b.type() + " " + b.parameter() + " " + java.util.Arrays.toString(b.critical()) + " " + b.located());
        }
    }
}
