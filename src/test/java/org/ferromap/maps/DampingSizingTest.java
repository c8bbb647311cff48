package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Problem;
import org.ferromap.study.Study;
import org.ferromap.study.StudyException;
import org.ferromap.study.StudyReader;
import org.junit.jupiter.api.Test;

class DampingSizingTest {

    private static final double W = 2 * Math.PI * 60;

    private static DampingResult size(Study s, DampingSettings d) {
        return DampingSizing.size(s, d, new LocalPoolExecutor(2));
    }

    /**
     * G_min = (w^2 C - a)(n-1)/(2 sqrt(n) w) for i = a lambda + b lambda^n (DOMAIN.md §7 [der]) on a
     * circuit given directly at kV scale; the added conductance is G_min less the loop's own 1/R.
     * Tolerance 1e-12 relative: closed form against closed form, rounding only.
     */
    @Test
    void cuspConductanceIsTheClosedForm() {
        Study s = DeliverableStudies.circuitStudy("15 kV peak", "100 kOhm", "");
        DampingResult r = size(s, DampingSettings.defaults().withEnsemble(SwitchingEnsemble.defaults().withAngles(2)));
        double c = 0.25e-6;
        double expected = (W * W * c - DeliverableStudies.A) * (DeliverableStudies.N - 1) / (2 * Math.sqrt(DeliverableStudies.N) * W);
        assertEquals(expected, r.cuspConductance(), 1e-12 * expected);
        assertEquals(1e-5, r.existingConductance(), 1e-17);
        assertEquals(expected - 1e-5, r.addedConductance(), 1e-12 * expected);
        assertEquals(1 / (expected - 1e-5), r.loopResistance(), 1e-9 / (expected - 1e-5));
        assertTrue(r.cuspMethod().startsWith("closed form"));
        assertTrue(r.bistableAsBuilt());
        assertTrue(Double.isNaN(r.loadPower()), "a circuit study has no nameplate");
    }

    /**
     * A delta winding with a polynomial curve reduces to a scaled curve (no closed form in the code):
     * the numerical G_min equals the closed form with the loop's a_eq = 2a (two delta windings in
     * parallel, lambda_D(i/2)) and C_eq = Ccs + 2 Ccc of one open phase (DOMAIN.md §1.2 and §7 [der]);
     * the load at rated voltage is P = 1.5 V^2 G_added (the loop sees a load like the core loss,
     * R_eq = 1.5 R). Tolerance 1e-6 relative: G_min^2 is the maximum of a function of the flux found
     * by a minimiser (1e-10 in log flux), or by bisection on the fold scan to 1e-7.
     */
    @Test
    void numericalCuspConductanceMatchesTheClosedFormOfTheLoop() {
        double a = 7e-3 / 3;   // a delta winding at line voltage: a third of the wye figure
        Study s = StudyReader.read(DeliverableStudies.polynomialEquipment("delta", a, 1e-14 / 243, 9, ""), "delta-poly.yaml");
        DampingResult r = size(s, DampingSettings.defaults().withUndamped(false).withSteps(1.25, 1)
                .withEnsemble(SwitchingEnsemble.defaults().withAngles(2).withResidualFluxes(0)));
        double ceq = (0.3 + 2 * 0.1) * 1e-9 * 1000;
        double expected = (W * W * ceq - 2 * a) * 8 / (2 * 3 * W);
        assertEquals(expected, r.cuspConductance(), 1e-6 * expected);
        double v = 12.47e3;
        double g0 = 400 / (1.5 * v * v);
        assertEquals(g0, r.existingConductance(), 1e-12 * g0);
        assertEquals(1.5 * v * v * (r.cuspConductance() - g0), r.loadPower(), 1e-9 * r.loadPower());
        assertEquals(100 * r.loadPower() / 300e3, r.loadPercent(), 1e-9 * r.loadPercent());
    }

    /**
     * At this voltage alone the ferroresonant state disappears where the jump-down fold rises
     * above the source: the closed form of DOMAIN.md §3 [der] solved for G by Commons Math's Brent
     * solver. Tolerance 1e-6 relative: the code bisects to 1e-7.
     */
    @Test
    void voltageConductanceIsWhereTheJumpDownFoldPassesTheSource() {
        Study s = DeliverableStudies.circuitStudy("15 kV peak", "100 kOhm", "");
        DampingResult r = size(s, DampingSettings.defaults().withUndamped(false).withSteps(1.25, 1)
                .withEnsemble(SwitchingEnsemble.defaults().withAngles(2).withResidualFluxes(0)));
        PolynomialFolds pf = new PolynomialFolds(DeliverableStudies.A, DeliverableStudies.B, DeliverableStudies.N, W);
        double gMin = r.cuspConductance();
        double expected = new BrentSolver(1e-15, 1e-14).solve(1000,
                g -> pf.jumpDownSource(0.25e-6, 0.2e-6, g) - 15e3, 1e-5, gMin * (1 - 1e-9));
        assertEquals(expected, r.voltageConductance(), 1e-6 * expected);
        assertTrue(r.voltageConductance() < gMin);
    }

    /**
     * The time-domain confirmation [plausibility, cp]: as built, switching events end ferroresonant;
     * the recommended step is the first whose events all settle normal, and it is at or above G_min.
     */
    @Test
    void confirmationClearsEveryEventAtTheRecommendedStep() {
        Study s = DeliverableStudies.circuitStudy("15 kV peak", "100 kOhm", "");
        DampingResult r = size(s, DampingSettings.defaults().withEnsemble(SwitchingEnsemble.defaults().withAngles(4)));
        DampingResult.Step asBuilt = r.steps().get(0);
        assertEquals("as built", asBuilt.label());
        assertTrue(asBuilt.ferroresonant() > 0, "the undamped loop has ferroresonant outcomes");
        assertFalse(asBuilt.clear());
        DampingResult.Step rec = r.recommended();
        assertNotNull(rec);
        assertTrue(rec.clear());
        assertEquals(0, rec.ferroresonant());
        assertTrue(rec.totalConductance() >= r.cuspConductance() * (1 - 1e-12));
        assertEquals(4 * 3, rec.events());
        for (DampingResult.Step st : r.steps().subList(1, r.steps().size() - 1)) {
            assertFalse(st.clear(), "steps before the recommended one still had ferroresonant events");
        }
    }

    /** Problems in the damping block are reported with their paths before anything is simulated. */
    @Test
    void badSettingsAreReportedWithTheirPaths() {
        String analyses = String.join("\n",
                "analyses:",
                "  damping:",
                "    length: 1 km",
                "    step: 0.5",
                "    arrester: {energy-rating: 4.5 kJ}");
        StudyException e = assertThrows(StudyException.class,
                () -> DampingSettings.from(DeliverableStudies.circuitStudy("15 kV peak", "100 kOhm", analyses)));
        List<String> paths = e.problems().stream().map(Problem::path).toList();
        assertTrue(paths.contains("analyses.damping.length"), paths.toString());
        assertTrue(paths.contains("analyses.damping.step"), paths.toString());
        assertTrue(paths.contains("analyses.damping.arrester.rated-voltage"), paths.toString());
        assertTrue(paths.contains("analyses.damping.arrester.energy-rating"), paths.toString());
        assertEquals(MessageKey.BAD_REQUEST, e.problems().get(0).key());
    }
}
