package org.ferromap.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The one JSON writer: records serialise by their component names (the contract fields), and
 * non-finite numbers become {@code null} because JSON has no NaN or infinity.
 */
public final class Json {

    private static final ObjectMapper MAPPER = build();

    private Json() {
    }

    private static ObjectMapper build() {
        SimpleModule finite = new SimpleModule("finite-doubles");
        JsonSerializer<Double> ser = new JsonSerializer<>() {
            @Override
            public void serialize(Double v, JsonGenerator g, SerializerProvider p) throws IOException {
                if (v == null || v.isNaN() || v.isInfinite()) {
                    g.writeNull();
                } else {
                    g.writeNumber(v);
                }
            }
        };
        finite.addSerializer(Double.class, ser);
        finite.addSerializer(double.class, ser);
        return new ObjectMapper().registerModule(finite).enable(SerializationFeature.INDENT_OUTPUT);
    }

    /** The object as indented JSON text. */
    public static String text(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (IOException e) {
            throw new IllegalStateException("result not serialisable as JSON: " + value.getClass(), e);
        }
    }

    /** Writes the object as JSON to a file. */
    public static void write(Object value, Path file) {
        try {
            Files.writeString(file, text(value) + "\n");
        } catch (IOException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot write " + file + ": " + e.getMessage(), e);
        }
    }

    /** The shared mapper, for readers in tests. */
    public static ObjectMapper mapper() {
        return MAPPER;
    }
}
