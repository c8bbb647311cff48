package org.ferromap.maps;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Objects;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.MapAxis;
import org.ferromap.study.MapSettings;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;

/**
 * The plane a study map covers: two study parameters on two axes, and the equivalent circuit at
 * any point of it ({@link StudyParameters#circuit}: equipment-level parameters such as the cable
 * length re-reduce the installation). Immutable and thread-safe.
 */
public final class StudyPlane {

    private final StudyParameters parameters;
    private final PlaneAxis x;
    private final PlaneAxis y;
    private final String studyHash;
    private final org.ferromap.equipment.SaturationCurve studyCurve;
    private final org.ferromap.equipment.SaturationCurve balanceCurve;

    /**
     * @throws FerromapException {@code BAD_REQUEST} when both axes sweep the same parameter, and
     *         the key of {@link StudyParameters#circuit} ({@code OUT_OF_RANGE}, {@code BAD_REQUEST})
     *         when a corner of the plane is outside a parameter's physical range; checked here, before
     *         anything is computed
     */
    public StudyPlane(StudyParameters parameters, PlaneAxis x, PlaneAxis y) {
        this.parameters = Objects.requireNonNull(parameters, "parameters");
        this.x = Objects.requireNonNull(x, "x");
        this.y = Objects.requireNonNull(y, "y");
        if (x.parameter() == y.parameter()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "both map axes sweep " + x.parameter().studyName()
                    + "; choose two different parameters");
        }
        // Every parameter's range check is an interval, so the four corners cover the plane.
        for (double xv : new double[] {x.axis().from(), x.axis().to()}) {
            for (double yv : new double[] {y.axis().from(), y.axis().to()}) {
                try {
                    circuit(xv, yv);
                } catch (FerromapException e) {
                    throw new FerromapException(e.key(), "the map corner " + x.parameter().studyName() + " = " + xv + " "
                            + x.unit() + ", " + y.parameter().studyName() + " = " + yv + " " + y.unit()
                            + " cannot be used: " + e.getMessage(), e);
                }
            }
        }
        this.studyHash = studyHash(parameters.study());
        this.studyCurve = parameters.study().circuit().magnetizing();
        this.balanceCurve = MemoizedCurve.wrap(studyCurve);
    }

    /** The plane of a study's {@code map:} section; {@code BAD_REQUEST} when it has none or only one axis. */
    public static StudyPlane of(StudyParameters parameters, MapSettings map) {
        if (map == null || map.x() == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the study has no map: section; give the axes, e.g. "
                    + "--x source --x-from '10 kV peak' --x-to '40 kV peak' --x-steps 61 --y ...");
        }
        if (map.y() == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the study's map: section has only an x axis ("
                    + map.x().parameter().studyName() + "); a map needs a y axis too (map.y or --y)");
        }
        return new StudyPlane(parameters, axis(parameters, map.x()), axis(parameters, map.y()));
    }

    /** A study axis as a plane axis (SI bounds get a display unit; per-unit bounds stay per unit). */
    public static PlaneAxis axis(StudyParameters parameters, MapAxis a) {
        Axis.Scale scale = a.scale() == MapAxis.Scale.LOG ? Axis.Scale.LOG : Axis.Scale.LINEAR;
        if (a.perUnit()) {
            return PlaneAxis.perUnit(a.parameter(), a.from(), a.to(), a.steps(), scale, parameters.valueOf(a.parameter()));
        }
        return PlaneAxis.ofSi(a.parameter(), a.from(), a.to(), a.steps(), scale);
    }

    /** The horizontal axis. */
    public PlaneAxis x() {
        return x;
    }

    /** The vertical axis. */
    public PlaneAxis y() {
        return y;
    }

    /** The study mapped. */
    public Study study() {
        return parameters.study();
    }

    /** The study's parameters. */
    public StudyParameters parameters() {
        return parameters;
    }

    /** Whether one of the axes is the given parameter. */
    public boolean sweeps(SweepParameter p) {
        return x.parameter() == p || y.parameter() == p;
    }

    /** The equivalent circuit at the point {@code (xv, yv)}, given in the axes' display units. */
    public EquivalentCircuit circuit(double xv, double yv) {
        return parameters.circuit(x.parameter(), x.si(xv), y.parameter(), y.si(yv));
    }

    /**
     * The circuit at a point for the balance: the same circuit, its magnetizing curve (when it is
     * the study's, as for every parameter but none) remembering recent values across cells
     * ({@link MemoizedCurve}: bit-identical results, less quadrature).
     */
    public EquivalentCircuit balanceCircuit(double xv, double yv) {
        EquivalentCircuit c = circuit(xv, yv);
        return balanceCurve != studyCurve && c.magnetizing() == studyCurve ? c.withMagnetizing(balanceCurve) : c;
    }

    /** The grid to compute, with the given tile side. */
    public MapRequest request(int tileSize) {
        return new MapRequest(x.axis(), y.axis(), tileSize);
    }

    /**
     * Identifies the plane's physics for resume tiles: the study's content (a hash of the file,
     * or of the circuit and installation when there is no file) and each axis's parameter and SI
     * factor. The samples themselves are in the run key already.
     */
    public String fingerprint() {
        return "study " + studyHash + "; x " + x.fingerprint() + "; y " + y.fingerprint();
    }

    /** SHA-256 of the study file's bytes, or of the assembled circuit and installation when the file is not on disk. */
    static String studyHash(Study s) {
        byte[] content = null;
        Path f = s.file();
        if (f != null && Files.isRegularFile(f)) {
            try {
                content = Files.readAllBytes(f);
            } catch (IOException e) {
                content = null;
            }
        }
        if (content == null) {
            content = (s.circuit() + "|" + s.equipment()).getBytes(StandardCharsets.UTF_8);
        }
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(content));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
