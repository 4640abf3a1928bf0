package org.gyreplan.app.scenario;

import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLGenerator;
import org.gyreplan.gisdata.io.AtomicWrite;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;
import java.util.stream.Collectors;

/**
 * Reads and writes scenario files (YAML).
 *
 * <pre>
 *   Scenario s = ScenarioFiles.load(Path.of("scenarios/demo/scenario.yaml"));   // throws ScenarioException
 *   ScenarioFiles.save(s, Path.of("my-study.yaml"));
 * </pre>
 *
 * <p>Loading checks, before any work: YAML syntax, unknown keys, wrong types, unknown names (with the allowed
 * ones), impossible values and missing files. Every problem is reported with the file, the line and the key.
 */
public final class ScenarioFiles {
    private ScenarioFiles() {}

    private static final ObjectMapper READER = new ObjectMapper(new YAMLFactory()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION))
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES);

    private static final ObjectMapper WRITER = new ObjectMapper(new YAMLFactory()
            .disable(YAMLGenerator.Feature.WRITE_DOC_START_MARKER)
            .enable(YAMLGenerator.Feature.MINIMIZE_QUOTES)
            .enable(YAMLGenerator.Feature.INDENT_ARRAYS_WITH_INDICATOR))
            .disable(SerializationFeature.WRITE_DATES_AS_TIMESTAMPS);

    /** Reads, binds and validates a scenario file; relative file names resolve against its folder. */
    public static Scenario load(Path file) throws ScenarioException {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new ScenarioException(new ScenarioProblem(file, 0, 0, "", "scenario file not found"));
        } catch (IOException e) {
            throw new ScenarioException(new ScenarioProblem(file, 0, 0, "", "cannot read the file: " + e.getMessage()));
        }
        Path base = file.toAbsolutePath().getParent();
        return parse(text, file, base);
    }

    /**
     * Binds and validates scenario text.
     *
     * @param text    YAML text
     * @param file    name used in messages (may be null)
     * @param baseDir folder for relative file names
     */
    public static Scenario parse(String text, Path file, Path baseDir) throws ScenarioException {
        Map<String, JsonLocation> where = text.isBlank() ? Map.of() : locate(text, file);
        Scenario s = null;
        if (!text.isBlank()) {
            try {
                s = READER.readValue(text, Scenario.class);
            } catch (JsonProcessingException e) {
                throw new ScenarioException(describe(e, file, where));
            }
        }
        if (s == null) {
            throw new ScenarioException(new ScenarioProblem(file, 0, 0, "", "the file is empty; expected the keys "
                    + String.join(", ", topLevelKeys())));
        }
        s.baseDir = baseDir == null ? Path.of(".").toAbsolutePath() : baseDir;
        s.sourceFile = file;
        for (Map.Entry<String, JsonLocation> e : where.entrySet()) s.keyLines.put(e.getKey(), e.getValue().getLineNr());
        List<ScenarioProblem> problems = ScenarioValidator.validate(s, pointer -> lookup(where, pointer), file);
        if (!problems.isEmpty()) throw new ScenarioException(problems);
        return s;
    }

    /**
     * Writes a scenario as YAML (atomically). Relative file names are rewritten so that they still point at
     * the same files when the target folder differs from the scenario's {@link Scenario#baseDir}.
     */
    public static void save(Scenario s, Path target) throws IOException {
        AtomicWrite.writeString(target, toYaml(s, target.toAbsolutePath().getParent()));
    }

    /** The YAML text of a scenario, with relative file names expressed against {@code newBase}. */
    public static String toYaml(Scenario s, Path newBase) throws IOException {
        Scenario copy = WRITER.readValue(WRITER.writeValueAsString(s), Scenario.class);
        Path oldBase = s.baseDir.toAbsolutePath().normalize();
        Path nb = newBase == null ? oldBase : newBase.toAbsolutePath().normalize();
        UnaryOperator<String> move = name -> {
            if (name == null) return null;
            Path p = Path.of(name);
            if (p.isAbsolute() || oldBase.equals(nb)) return name;
            return nb.relativize(oldBase.resolve(p).normalize()).toString().replace('\\', '/');
        };
        copy.basin.polygon = move.apply(copy.basin.polygon);
        copy.winds.file = move.apply(copy.winds.file);
        copy.bathymetry = move.apply(copy.bathymetry);
        copy.exclusionZones = move.apply(copy.exclusionZones);
        return "# Gyreplan scenario\n" + WRITER.writeValueAsString(copy);
    }

    /** The allowed top-level keys, in file order. */
    public static List<String> topLevelKeys() {
        return List.of("study", "basin", "grid", "winds", "dragLaw", "constants", "gyre", "coast", "bathymetry",
                "exclusionZones", "moorings", "survey", "outputs", "expected");
    }

    // --- locations ---------------------------------------------------------------------------------

    /** JSON pointer (e.g. {@code /gyre/depth}) → location of the key (or array element) in the text. */
    static Map<String, JsonLocation> locate(String text, Path file) throws ScenarioException {
        Map<String, JsonLocation> map = new HashMap<>();
        try (JsonParser p = READER.getFactory().createParser(text)) {
            JsonToken t;
            while ((t = p.nextToken()) != null) {
                JsonStreamContext ctx = p.getParsingContext();
                if (t == JsonToken.FIELD_NAME) {
                    map.put(ctx.pathAsPointer().toString(), p.currentTokenLocation());
                } else if (t == JsonToken.START_ARRAY || t == JsonToken.START_OBJECT) {
                    JsonStreamContext parent = ctx.getParent();
                    if (parent != null && parent.inArray()) {
                        map.putIfAbsent(parent.pathAsPointer().toString(), p.currentTokenLocation());
                    }
                } else if (ctx.inArray()) {
                    map.putIfAbsent(ctx.pathAsPointer().toString(), p.currentTokenLocation());
                }
            }
        } catch (JsonProcessingException e) {
            throw new ScenarioException(describe(e, file, Map.of()));
        } catch (IOException e) {
            throw new ScenarioException(new ScenarioProblem(file, 0, 0, "", "cannot read: " + e.getMessage()));
        }
        return map;
    }

    /** Location of a pointer, falling back to the nearest enclosing key that has one. */
    private static JsonLocation lookup(Map<String, JsonLocation> where, String pointer) {
        String p = pointer;
        while (true) {
            JsonLocation loc = where.get(p);
            if (loc != null) return loc;
            int cut = p.lastIndexOf('/');
            if (cut <= 0) return null;
            p = p.substring(0, cut);
        }
    }

    // --- binding errors --------------------------------------------------------------------------------

    private static ScenarioProblem describe(JsonProcessingException e, Path file, Map<String, JsonLocation> where) {
        JsonLocation loc = e.getLocation();
        if (e instanceof JsonMappingException m && !m.getPath().isEmpty()) {
            JsonLocation keyLoc = where.get(pointer(m.getPath()));
            if (keyLoc != null) loc = keyLoc;
        }
        int line = loc == null ? 0 : loc.getLineNr();
        int col = loc == null ? 0 : loc.getColumnNr();
        if (e instanceof UnrecognizedPropertyException u) {
            String parent = dotted(u.getPath().subList(0, u.getPath().size() - 1));
            List<String> known = u.getKnownPropertyIds() == null ? List.of()
                    : u.getKnownPropertyIds().stream().map(Object::toString).sorted().toList();
            String place = parent.isEmpty() ? "at the top level" : "in '" + parent + "'";
            return new ScenarioProblem(file, line, col, dotted(u.getPath()),
                    "unknown key '" + u.getPropertyName() + "' " + place + "; allowed keys: " + String.join(", ", known));
        }
        if (e instanceof InvalidFormatException f) {
            Class<?> target = f.getTargetType();
            String got = String.valueOf(f.getValue());
            if (target != null && target.isEnum()) {
                return new ScenarioProblem(file, line, col, dotted(f.getPath()),
                        "unknown value '" + got + "'; allowed values: " + String.join(", ", enumNames(target)));
            }
            return new ScenarioProblem(file, line, col, dotted(f.getPath()),
                    "expected " + typeWord(target) + ", got '" + got + "'");
        }
        if (e instanceof MismatchedInputException m) {
            Class<?> target = m.getTargetType();
            if (target != null && target.isEnum()) {
                return new ScenarioProblem(file, line, col, dotted(m.getPath()),
                        "expected one of: " + String.join(", ", enumNames(target)));
            }
            return new ScenarioProblem(file, line, col, dotted(m.getPath()),
                    "expected " + typeWord(target) + firstLine(m.getOriginalMessage()));
        }
        if (e instanceof JsonMappingException m) {
            return new ScenarioProblem(file, line, col, dotted(m.getPath()), firstLine(m.getOriginalMessage()));
        }
        return new ScenarioProblem(file, line, col, "", "not valid YAML: " + firstLine(e.getOriginalMessage()));
    }

    private static String firstLine(String s) {
        if (s == null) return "";
        int nl = s.indexOf('\n');
        String one = nl < 0 ? s : s.substring(0, nl);
        // Jackson's messages name Java classes; keep only the readable part.
        one = one.replaceAll("`[a-zA-Z0-9_.$]+`", "").replaceAll("\\s+", " ").trim();
        return one.isEmpty() ? "" : " (" + one + ")";
    }

    static List<String> enumNames(Class<?> type) {
        return Arrays.stream(type.getFields()).filter(java.lang.reflect.Field::isEnumConstant).map(f -> {
            JsonProperty jp = f.getAnnotation(JsonProperty.class);
            return jp != null ? jp.value() : f.getName();
        }).collect(Collectors.toList());
    }

    private static String typeWord(Class<?> t) {
        if (t == null) return "another kind of value";
        if (t == Double.class || t == double.class) return "a number";
        if (t == Integer.class || t == int.class) return "a whole number";
        if (t == String.class) return "a text value";
        if (t == Boolean.class || t == boolean.class) return "true or false";
        if (List.class.isAssignableFrom(t)) return "a list";
        if (Map.class.isAssignableFrom(t)) return "a map of keys to values";
        return "a block of keys (" + String.join(", ", propertyNames(t)) + ")";
    }

    private static List<String> propertyNames(Class<?> t) {
        List<String> names = new ArrayList<>();
        for (var f : t.getFields()) {
            if (java.lang.reflect.Modifier.isStatic(f.getModifiers())) continue;
            if (f.isAnnotationPresent(com.fasterxml.jackson.annotation.JsonIgnore.class)) continue;
            names.add(f.getName());
        }
        return names;
    }

    private static String pointer(List<JsonMappingException.Reference> path) {
        StringBuilder sb = new StringBuilder();
        for (JsonMappingException.Reference r : path) {
            sb.append('/').append(r.getFieldName() != null ? r.getFieldName() : Integer.toString(r.getIndex()));
        }
        return sb.toString();
    }

    private static String dotted(List<JsonMappingException.Reference> path) {
        StringBuilder sb = new StringBuilder();
        for (JsonMappingException.Reference r : path) {
            if (r.getFieldName() != null) {
                if (sb.length() > 0) sb.append('.');
                sb.append(r.getFieldName());
            } else if (r.getIndex() >= 0) {
                sb.append('[').append(r.getIndex()).append(']');
            }
        }
        return sb.toString();
    }
}
