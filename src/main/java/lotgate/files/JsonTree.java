package lotgate.files;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.io.JsonStringEncoder;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.MissingNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Arrays;
import java.util.Map;

/**
 * JSON text to Jackson trees and back through Jackson's streaming parser and generator alone. The
 * trees, numbers and layout are those of Jackson's data-binding mapper ({@code readTree},
 * {@code writeValueAsString} with or without indentation), but the mapper's start-up (35 ms, a fifth
 * of a short command) is not paid: lotgate's files are trees, never bound to classes.
 */
public final class JsonTree {
    private static final JsonFactory STRICT = JsonFactory.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION).build();
    private static final JsonFactory LENIENT = JsonFactory.builder().build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private JsonTree() {
    }

    /**
     * The tree of a text that must hold exactly one JSON value with no name given twice in an
     * object; an empty text is the missing node.
     *
     * @throws JsonParseException at the place where the text breaks one of these rules
     */
    public static JsonNode strict(String text) throws IOException {
        return read(STRICT, text, true);
    }

    /** The tree of the first JSON value in a text, as the mapper reads it: a repeated name keeps its last value. */
    public static JsonNode lenient(String text) throws IOException {
        return read(LENIENT, text, false);
    }

    /** The tree as compact text, no white space. */
    public static String compact(JsonNode node) {
        return write(node, false, false);
    }

    /** The tree as indented text, as the mapper indents it (no final line break). */
    public static String indented(JsonNode node) {
        return write(node, true, false);
    }

    /**
     * The tree as compact text with the names of every object in sorted order, at every level. A tree of plain
     * values is written into this thread's shared builder; any other is written again by {@link #write} into a writer
     * of its own, which never calls back here, so the builder's partial text is never in use twice.
     */
    public static String sortedCompact(JsonNode node) {
        StringBuilder text = BUILDER.get();
        if (text.capacity() > KEPT_CAPACITY) {
            text = new StringBuilder(512);
            BUILDER.set(text);
        }
        text.setLength(0);
        return plainSorted(text, node) ? text.toString() : write(node, false, true);
    }

    /** The compact text of an array of texts, as {@link #sortedCompact} writes it (a lot key's). */
    public static String textArray(String... texts) {
        StringBuilder out = new StringBuilder(16 + 2 * texts.length + Arrays.stream(texts).mapToInt(String::length).sum());
        out.append('[');
        for (int i = 0; i < texts.length; i++) {
            if (i > 0) {
                out.append(',');
            }
            quoted(out, texts[i]);
        }
        return out.append(']').toString();
    }

    /** One builder per thread for {@link #sortedCompact}: an import writes a record's text per lot. */
    private static final ThreadLocal<StringBuilder> BUILDER = ThreadLocal.withInitial(() -> new StringBuilder(512));
    /** A builder grown past this by a large tree is not kept. */
    private static final int KEPT_CAPACITY = 1 << 16;

    private static final JsonStringEncoder QUOTES = JsonStringEncoder.getInstance();

    /**
     * Writes the tree as the generator writes it with sorted names, for trees of objects, arrays, text, whole
     * numbers of int or long, booleans and nulls (every history record and lot key): without a generator and a
     * look-up per name, a fifth of an import's time for making its records. Returns false at any other node, having
     * written part of the tree, for the generator to write the whole.
     */
    private static boolean plainSorted(StringBuilder out, JsonNode node) {
        switch (node.getNodeType()) {
            case OBJECT -> {
                @SuppressWarnings("unchecked")
                Map.Entry<String, JsonNode>[] fields = node.properties().toArray(new Map.Entry[0]);
                NameOrder order = NameOrder.of(fields);
                out.append('{');
                for (int i = 0; i < fields.length; i++) {
                    if (i > 0) {
                        out.append(',');
                    }
                    out.append(order.quoted[i]);
                    if (!plainSorted(out, fields[order.field[i]].getValue())) {
                        return false;
                    }
                }
                out.append('}');
            }
            case ARRAY -> {
                out.append('[');
                for (int i = 0; i < node.size(); i++) {
                    if (i > 0) {
                        out.append(',');
                    }
                    if (!plainSorted(out, node.get(i))) {
                        return false;
                    }
                }
                out.append(']');
            }
            case STRING -> quoted(out, node.textValue());
            case NUMBER -> {
                switch (node.numberType()) {
                    case INT -> out.append(node.intValue());
                    case LONG -> out.append(node.longValue());
                    default -> {
                        return false;
                    }
                }
            }
            case BOOLEAN -> out.append(node.booleanValue());
            case NULL -> out.append("null");
            default -> {
                return false;
            }
        }
        return true;
    }

    /**
     * The sorted order of an object's names, with each name quoted and followed by its colon. An import writes
     * objects with the same names in the same order, lot after lot: the order of the last object of each size is
     * kept per thread and used again when the names match (sorting and quoting them took a quarter of the time
     * to write a record's text).
     */
    private static final class NameOrder {
        private static final int KEPT_SIZES = 32;
        private static final ThreadLocal<NameOrder[]> LAST = ThreadLocal.withInitial(() -> new NameOrder[KEPT_SIZES]);

        private final String[] names;
        /** The i-th field in sorted order. */
        final int[] field;
        /** The i-th name in sorted order, quoted, and its colon. */
        final String[] quoted;

        private NameOrder(Map.Entry<String, JsonNode>[] fields) {
            names = new String[fields.length];
            for (int i = 0; i < fields.length; i++) {
                names[i] = fields[i].getKey();
            }
            Integer[] sorted = new Integer[fields.length];
            for (int i = 0; i < sorted.length; i++) {
                sorted[i] = i;
            }
            Arrays.sort(sorted, (a, b) -> names[a].compareTo(names[b]));
            field = new int[fields.length];
            quoted = new String[fields.length];
            for (int i = 0; i < sorted.length; i++) {
                field[i] = sorted[i];
                quoted[i] = quoted(new StringBuilder(), names[sorted[i]]).append(':').toString();
            }
        }

        static NameOrder of(Map.Entry<String, JsonNode>[] fields) {
            if (fields.length >= KEPT_SIZES) {
                return new NameOrder(fields);
            }
            NameOrder[] last = LAST.get();
            NameOrder kept = last[fields.length];
            if (kept != null && kept.sameNames(fields)) {
                return kept;
            }
            NameOrder made = new NameOrder(fields);
            last[fields.length] = made;
            return made;
        }

        private boolean sameNames(Map.Entry<String, JsonNode>[] fields) {
            for (int i = 0; i < fields.length; i++) {
                String name = fields[i].getKey();
                if (name != names[i] && !name.equals(names[i])) {
                    return false;
                }
            }
            return true;
        }
    }

    /** The text in quotes, escaped as the generator escapes it. */
    private static StringBuilder quoted(StringBuilder out, String text) {
        out.append('"');
        QUOTES.quoteAsString(text, out);
        return out.append('"');
    }

    private static JsonNode read(JsonFactory factory, String text, boolean whole) throws IOException {
        try (JsonParser parser = factory.createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                return MissingNode.getInstance();
            }
            JsonNode root = value(parser, first);
            if (whole) {
                JsonToken trailing = parser.nextToken();
                if (trailing != null) {
                    throw new JsonParseException(parser, "Trailing token (of type " + trailing
                            + ") found after value: not allowed");
                }
            }
            return root;
        }
    }

    private static JsonNode value(JsonParser parser, JsonToken token) throws IOException {
        switch (token) {
            case START_OBJECT -> {
                ObjectNode object = NODES.objectNode();
                for (String name = parser.nextFieldName(); name != null; name = parser.nextFieldName()) {
                    object.set(name, value(parser, parser.nextToken()));
                }
                return object;
            }
            case START_ARRAY -> {
                ArrayNode array = NODES.arrayNode();
                for (JsonToken next = parser.nextToken(); next != JsonToken.END_ARRAY; next = parser.nextToken()) {
                    array.add(value(parser, next));
                }
                return array;
            }
            case VALUE_STRING -> {
                return NODES.textNode(parser.getText());
            }
            case VALUE_NUMBER_INT -> {
                return switch (parser.getNumberType()) {
                    case INT -> NODES.numberNode(parser.getIntValue());
                    case LONG -> NODES.numberNode(parser.getLongValue());
                    default -> NODES.numberNode(parser.getBigIntegerValue());
                };
            }
            case VALUE_NUMBER_FLOAT -> {
                return NODES.numberNode(parser.getDoubleValue());
            }
            case VALUE_TRUE, VALUE_FALSE -> {
                return NODES.booleanNode(token == JsonToken.VALUE_TRUE);
            }
            case VALUE_NULL -> {
                return NODES.nullNode();
            }
            default -> throw new JsonParseException(parser, "Unexpected token (" + token + ")");
        }
    }

    private static String write(JsonNode node, boolean indent, boolean sorted) {
        StringWriter text = new StringWriter();
        try (JsonGenerator generator = LENIENT.createGenerator(text)) {
            if (indent) {
                generator.useDefaultPrettyPrinter();
            }
            write(generator, node, sorted);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return text.toString();
    }

    private static void write(JsonGenerator out, JsonNode node, boolean sorted) throws IOException {
        switch (node.getNodeType()) {
            case OBJECT -> {
                out.writeStartObject();
                if (sorted) {
                    String[] names = new String[node.size()];
                    int named = 0;
                    for (Map.Entry<String, JsonNode> field : node.properties()) {
                        names[named++] = field.getKey();
                    }
                    Arrays.sort(names);
                    for (String name : names) {
                        out.writeFieldName(name);
                        write(out, node.get(name), true);
                    }
                } else {
                    for (Map.Entry<String, JsonNode> field : node.properties()) {
                        out.writeFieldName(field.getKey());
                        write(out, field.getValue(), false);
                    }
                }
                out.writeEndObject();
            }
            case ARRAY -> {
                out.writeStartArray();
                for (JsonNode element : node) {
                    write(out, element, sorted);
                }
                out.writeEndArray();
            }
            case STRING -> out.writeString(node.textValue());
            case NUMBER -> {
                switch (node.numberType()) {
                    case INT -> out.writeNumber(node.intValue());
                    case LONG -> out.writeNumber(node.longValue());
                    case BIG_INTEGER -> out.writeNumber(node.bigIntegerValue());
                    case FLOAT -> out.writeNumber(node.floatValue());
                    case BIG_DECIMAL -> out.writeNumber(node.decimalValue());
                    default -> out.writeNumber(node.doubleValue());
                }
            }
            case BOOLEAN -> out.writeBoolean(node.booleanValue());
            case NULL -> out.writeNull();
            default -> throw new IllegalArgumentException("not a JSON value: " + node.getNodeType());
        }
    }
}
