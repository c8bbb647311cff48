package org.ferromap.study;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.circuit.ReducedCircuit;
import org.ferromap.circuit.Reduction;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.Transformer;
import org.ferromap.equipment.TypicalTransformerData;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Reads study files (YAML, format in docs/STUDY-FORMAT.md).
 *
 * <pre>
 *   Study s = StudyReader.read(Path.of("maps/harlow-ridge-one-open.yaml"));
 *   EquivalentCircuit c = s.circuit();
 * </pre>
 *
 * The whole file is validated before anything fails: a {@link StudyException} lists every
 * problem with its path in the file, the offending value and what is allowed.
 * {@link #validate(Path)} stops after validation (no curve is built), for checking files.
 */
public final class StudyReader {

    private StudyReader() {
    }

    private static final YAMLMapper MAPPER = YAMLMapper.builder()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .build();

    /** Reads, validates and assembles a study file. */
    public static Study read(Path file) {
        return assemble(validate(file));
    }

    /** Reads, validates and assembles study text; {@code name} stands for the file in messages. */
    public static Study read(String yaml, String name) {
        return assemble(validate(yaml, name));
    }

    /** Reads and validates a study file without building curves or circuits. */
    public static ValidatedStudy validate(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw unreadable(file.toString(), "does not exist");
        } catch (CharacterCodingException e) {
            throw unreadable(file.toString(), "is not UTF-8 text (is it a study file?)");
        } catch (IOException e) {
            String why = Files.isDirectory(file) ? "is a folder, not a study file" : "cannot be read: " + e.getMessage();
            throw unreadable(file.toString(), why);
        }
        return validate(text, file);
    }

    /** Validates study text; {@code name} stands for the file in messages. */
    public static ValidatedStudy validate(String yaml, String name) {
        return validate(yaml, Path.of(name));
    }

    private static ValidatedStudy validate(String yaml, Path file) {
        String name = file.toString();
        JsonNode root;
        try {
            root = MAPPER.readTree(yaml);
        } catch (JsonProcessingException e) {
            JsonLocation loc = e.getLocation();
            String where = loc == null ? "" : " at line " + loc.getLineNr() + ", column " + loc.getColumnNr();
            String first = e.getOriginalMessage() == null ? "" : e.getOriginalMessage().lines().findFirst().orElse("");
            throw unreadable(name, "is not valid YAML" + where + ": " + first);
        }
        if (root == null || root.isMissingNode() || root.isNull()) {
            throw unreadable(name, "is empty; a study needs at least study:, frequency: and circuit: or equipment:");
        }
        if (!root.isObject()) {
            throw unreadable(name, "is not a study: expected a YAML mapping of keys (study, frequency, circuit or equipment, ...), "
                    + "found " + (root.isArray() ? "a list" : "a single value"));
        }
        return new StudyValidator(file, new Problems(name)).validate(root);
    }

    /**
     * Builds the curves, the transformer, the installation and the equivalent circuit of a
     * validated study. Problems found only now (a curve that its constructor refuses) are reported
     * the same way, with their path.
     */
    public static Study assemble(ValidatedStudy v) {
        Problems problems = new Problems(v.file().toString());
        List<String> notes = new ArrayList<>(v.notes());
        if (v.circuit() != null) {
            ValidatedStudy.CircuitSpec c = v.circuit();
            SaturationCurve curve = build(c.magnetizing(), "circuit.magnetizing", problems);
            EquivalentCircuit circuit = null;
            if (curve != null) {
                try {
                    circuit = new EquivalentCircuit(2 * Math.PI * v.frequency(), c.sourcePeak(), c.sourceAngle(),
                            c.seriesCapacitance(), c.shuntCapacitance(), c.coreLossResistance(), c.loadResistance(),
                            curve, Exactness.GIVEN, c.sourcePeak());
                } catch (FerromapException e) {
                    problems.add("circuit", "", e.getMessage(), e.key());
                }
            }
            problems.throwIfAny();
            return new Study(v.title(), v.description(), v.file(), v.frequency(), circuit, null, null,
                    Exactness.GIVEN, v.analyses(), v.map(), notes);
        }
        ValidatedStudy.EquipmentSpec e = v.equipment();
        ValidatedStudy.TransformerSpec ts = e.transformer();
        SaturationCurve curve = build(ts.saturation(), "equipment.transformer.saturation", problems);
        problems.throwIfAny();
        Installation in;
        ReducedCircuit reduced;
        try {
            Transformer t = new Transformer(ts.rating(), ts.primaryVoltage(), ts.ratedFrequency(), ts.connection(),
                    ts.core(), ts.excitingCurrent(), ts.noLoadLoss(), curve);
            notes.addAll(TypicalTransformerData.remarks(t));
            in = new Installation(e.sourceLineVoltage(), e.sourceAngle(), v.frequency(), t, e.cable(),
                    e.cableLength(), e.openPhases());
            reduced = Reduction.reduce(in);
        } catch (FerromapException ex) {
            problems.add("equipment", "", ex.getMessage(), ex.key());
            problems.throwIfAny();
            throw ex; // not reached
        }
        notes.add(reduced.explanation());
        return new Study(v.title(), v.description(), v.file(), v.frequency(), reduced.circuit(), in, reduced,
                reduced.circuit().exactness(), v.analyses(), v.map(), notes);
    }

    private static SaturationCurve build(CurveSpec spec, String path, Problems problems) {
        try {
            return spec.build();
        } catch (FerromapException e) {
            problems.add(path + "." + spec.form(), "", e.getMessage(), e.key());
            return null;
        }
    }

    private static StudyException unreadable(String file, String why) {
        return new StudyException(List.of(new Problem(file, "", "", why, MessageKey.UNREADABLE_FILE)));
    }
}
