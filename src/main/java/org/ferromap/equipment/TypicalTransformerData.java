package org.ferromap.equipment;

import java.util.ArrayList;
import java.util.List;

/**
 * Typical figures for distribution transformers, each with its source tag as DOMAIN.md §2 gives
 * it ([mem] recalled from the named source and not re-read; [cp] common practice; [der] derived
 * here). For filling gaps in a study and for flagging data that look unusual, never as test
 * expectations of the physics.
 */
public final class TypicalTransformerData {

    private TypicalTransformerData() {
    }

    /** A value with its unit and source. */
    public record Sourced(double value, String unit, String source) { }

    /** A range with its unit and source. */
    public record Range(double low, double high, String unit, String source) {
        /** Whether v lies in [low, high]. */
        public boolean contains(double v) {
            return v >= low && v <= high;
        }
    }

    /** One rating of the EU Tier 2 no-load-loss table. */
    public record LossEntry(double rating, double noLoadLoss, String source) { }

    private static final String TIER2 = "[mem: EU Regulation 548/2014, Tier 2 maximum no-load loss, "
            + "liquid-immersed, Um <= 24 kV]";

    /** EU Regulation 548/2014 Tier 2 no-load losses, rating VA to W [mem]. */
    public static final List<LossEntry> TIER2_NO_LOAD_LOSS = List.of(
            new LossEntry(100e3, 130.0, TIER2),
            new LossEntry(400e3, 387.0, TIER2),
            new LossEntry(1000e3, 693.0, TIER2));

    /** Exciting current of distribution transformers, fraction of rated current: 0.2 % to 2 % [cp]. */
    public static final Range EXCITING_CURRENT = new Range(0.002, 0.02, "fraction of rated current",
            "[cp] distribution transformers; lower for large and amorphous-core units (DOMAIN.md §2)");

    /** No-load loss of current low-loss designs, fraction of rating: 0.07 % to 0.13 % [mem/cp]. */
    public static final Range NO_LOAD_LOSS_FRACTION = new Range(0.0007, 0.0013, "fraction of rating",
            "[mem/cp] current low-loss designs, consistent with EU 548/2014 Tier 2 (DOMAIN.md §2)");

    /** Grain-oriented steel: saturation near 2.0 T [mem/cp]. */
    public static final Sourced GRAIN_ORIENTED_SATURATION = new Sourced(2.0, "T", "[mem/cp] DOMAIN.md §2");
    /** Grain-oriented steel: designed at 1.5 to 1.75 T [mem/cp]. */
    public static final Range GRAIN_ORIENTED_DESIGN = new Range(1.5, 1.75, "T", "[mem/cp] DOMAIN.md §2");
    /** Amorphous iron: saturation near 1.56 T [mem/cp]. */
    public static final Sourced AMORPHOUS_SATURATION = new Sourced(1.56, "T", "[mem/cp] DOMAIN.md §2");
    /** Amorphous iron: designed at 1.3 to 1.4 T [mem/cp]. */
    public static final Range AMORPHOUS_DESIGN = new Range(1.3, 1.4, "T", "[mem/cp] DOMAIN.md §2");
    /** Knee of the magnetizing curve, per unit of rated peak flux: 1.1 to 1.2 [mem/cp]. */
    public static final Range KNEE_FLUX = new Range(1.1, 1.2, "pu of rated flux", "[mem/cp] DOMAIN.md §2, grain-oriented");
    /** Rated-voltage magnetizing reactance over air-core reactance: 1e3 to 1e4 [mem/cp]. */
    public static final Range MAGNETIZING_TO_AIR_CORE = new Range(1e3, 1e4, "ratio", "[mem/cp] DOMAIN.md §2");

    /**
     * A typical no-load loss for a rating, W: the Tier 2 value where the rating is tabulated;
     * between tabulated ratings, interpolation linear in log(rating) and log(loss) [der, from the
     * [mem] table; loss grows like a power of rating]; outside 100 kVA to 1000 kVA, 0.1 % of the
     * rating, the middle of the low-loss range [mem/cp].
     *
     * @param rating three-phase rating, VA, &gt; 0
     */
    public static Sourced noLoadLoss(double rating) {
        List<LossEntry> t = TIER2_NO_LOAD_LOSS;
        for (LossEntry e : t) {
            if (Math.abs(e.rating() - rating) <= 1e-9 * rating) {
                return new Sourced(e.noLoadLoss(), "W", e.source());
            }
        }
        for (int k = 0; k + 1 < t.size(); k++) {
            LossEntry lo = t.get(k);
            LossEntry hi = t.get(k + 1);
            if (rating > lo.rating() && rating < hi.rating()) {
                double s = Math.log(rating / lo.rating()) / Math.log(hi.rating() / lo.rating());
                double w = lo.noLoadLoss() * Math.pow(hi.noLoadLoss() / lo.noLoadLoss(), s);
                return new Sourced(w, "W", "[der] log-log interpolation of " + TIER2);
            }
        }
        return new Sourced(0.001 * rating, "W", "[mem/cp] 0.1 % of rating, middle of the low-loss range "
                + "(outside the 100 kVA to 1000 kVA Tier 2 values known here)");
    }

    /**
     * Remarks on a transformer whose figures fall outside the typical ranges above; empty when
     * nothing looks unusual. Remarks inform; they are not errors.
     */
    public static List<String> remarks(Transformer t) {
        List<String> out = new ArrayList<>();
        if (!EXCITING_CURRENT.contains(t.excitingCurrent())) {
            out.add(String.format("exciting current %.3g %% is outside the typical %.1f %% to %.0f %% %s",
                    100 * t.excitingCurrent(), 100 * EXCITING_CURRENT.low(), 100 * EXCITING_CURRENT.high(),
                    EXCITING_CURRENT.source()));
        }
        double f = t.noLoadLoss() / t.rating();
        // The range is stated as "about": 10 % either side before remarking on it.
        if (t.noLoadLoss() > 0 && f < 0.9 * NO_LOAD_LOSS_FRACTION.low()) {
            out.add(String.format("no-load loss %.3g %% of rating is below the about %.2f %% to %.2f %% of current "
                            + "grain-oriented low-loss designs (amorphous cores reach it; lower loss means less damping) %s",
                    100 * f, 100 * NO_LOAD_LOSS_FRACTION.low(), 100 * NO_LOAD_LOSS_FRACTION.high(), NO_LOAD_LOSS_FRACTION.source()));
        } else if (f > 1.1 * NO_LOAD_LOSS_FRACTION.high()) {
            out.add(String.format("no-load loss %.3g %% of rating is above the about %.2f %% to %.2f %% of current "
                            + "low-loss designs (older designs lose more) %s",
                    100 * f, 100 * NO_LOAD_LOSS_FRACTION.low(), 100 * NO_LOAD_LOSS_FRACTION.high(), NO_LOAD_LOSS_FRACTION.source()));
        }
        return List.copyOf(out);
    }
}
