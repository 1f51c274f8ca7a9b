package lotgate.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.junit.jupiter.api.Test;

/**
 * The streaming reader and writer against the reference they replace: Jackson's data-binding mapper
 * (jackson-databind, the version in the pom), which reads and writes the same trees and text. A
 * fingerprint computed one way must equal the other to the byte, or every saved plan breaks.
 */
class JsonTreeTest {
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION).build();
    private static final ObjectMapper INDENTING = JsonMapper.builder()
            .enable(SerializationFeature.INDENT_OUTPUT).build();

    @Test
    void everySavedPlanReadsAndWritesAsTheMapperDoes() throws IOException {
        List<Path> files = new ArrayList<>();
        try (Stream<Path> plans = Files.list(Path.of("plans"))) {
            plans.filter(p -> p.toString().endsWith(".json")).forEach(files::add);
        }
        assertTrue(files.size() >= 5, files.toString());
        for (Path file : files) {
            String text = Files.readString(file);
            JsonNode tree = JsonTree.strict(text);
            assertEquals(MAPPER.readTree(text), tree, file.toString());
            assertEquals(INDENTING.writeValueAsString(tree), JsonTree.indented(tree), file.toString());
            assertEquals(MAPPER.writeValueAsString(tree), JsonTree.compact(tree), file.toString());
            assertEquals(MAPPER.writeValueAsString(sortedByMapper(tree)), JsonTree.sortedCompact(tree), file.toString());
            // The file as saved is the indented text and a line break.
            assertEquals(text, JsonTree.indented(tree) + "\n", file.toString());
        }
    }

    @Property(tries = 300)
    void anyTreeIsWrittenAsTheMapperWritesItAndReadsBackEqual(@ForAll("trees") JsonNode tree) throws IOException {
        String compact = JsonTree.compact(tree);
        assertEquals(MAPPER.writeValueAsString(tree), compact);
        assertEquals(INDENTING.writeValueAsString(tree), JsonTree.indented(tree));
        assertEquals(MAPPER.writeValueAsString(sortedByMapper(tree)), JsonTree.sortedCompact(tree));
        assertEquals(MAPPER.readTree(compact), JsonTree.strict(compact));
    }

    /** Trees of text, whole numbers, booleans and nulls, written without the generator, and names of any text. */
    @Property(tries = 500)
    void aPlainTreeIsWrittenSortedAsTheMapperWritesIt(@ForAll("plainTrees") JsonNode tree) throws IOException {
        assertEquals(MAPPER.writeValueAsString(sortedByMapper(tree)), JsonTree.sortedCompact(tree));
    }

    /**
     * The sorted order of the last object of each size is used again for the next with the same names: objects of
     * one size with the same names in another order, or with other names, are still written as the mapper writes
     * them sorted, one after the other.
     */
    @Test
    void objectsOfOneSizeAreEachWrittenInTheirOwnSortedOrder() throws IOException {
        String[] texts = {"{\"b\":1,\"a\":{\"y\":1,\"x\":2}}", "{\"a\":{\"x\":2,\"y\":1},\"b\":1}",
            "{\"c\":1,\"a\":{\"z\":3,\"x\":2}}", "{\"b\":1,\"a\":{\"y\":1,\"x\":2}}",
            "{\"B\":1,\"a\":{\"y\":1,\"\u00e9\":2}}"};
        for (int round = 0; round < 2; round++) {
            for (String text : texts) {
                JsonNode tree = MAPPER.readTree(text);
                assertEquals(MAPPER.writeValueAsString(sortedByMapper(tree)), JsonTree.sortedCompact(tree), text);
            }
        }
    }

    /** A lot key's text, written without a tree, as the mapper writes the array of its texts. */
    @Property(tries = 300)
    void anArrayOfTextsIsWrittenAsTheMapperWritesIt(@ForAll("texts") List<String> texts) throws IOException {
        ArrayNode array = JsonNodeFactory.instance.arrayNode();
        texts.forEach(array::add);
        assertEquals(MAPPER.writeValueAsString(array), CanonicalJson.textArray(texts.toArray(String[]::new)));
    }

    /**
     * The hash of lines fed to the digest piece by piece equals the JDK's SHA-256 (java.security.MessageDigest)
     * of the joined text in UTF-8, for texts longer than the digest's buffer and with any characters.
     */
    @Property(tries = 300)
    void linesAreHashedAsTheirJoinedTextIs(@ForAll("texts") List<String> lines, @ForAll int repeat)
            throws Exception {
        List<String> longer = new ArrayList<>(lines);
        longer.add("x".repeat(Math.floorMod(repeat, 9000)) + String.join("", lines));
        String joined = String.join("\n", longer);
        String expected = java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest(joined.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        assertEquals(expected, CanonicalJson.sha256Lines(longer.toArray(String[]::new)));
        assertEquals(expected, CanonicalJson.sha256(joined));
    }

    @Provide
    Arbitrary<List<String>> texts() {
        return Arbitraries.strings().withCharRange('\u0000', '\u00ff')
                .withChars('\u2028', '\ud83d', '\ude00', '\ud800', '\u00e9').ofMaxLength(40).list().ofMaxSize(5);
    }

    @Test
    void aNameGivenTwiceIsRefusedWhereItStands() {
        JsonParseException e = assertThrows(JsonParseException.class,
                () -> JsonTree.strict("{\n  \"n\": 1,\n  \"n\": 2\n}"));
        assertTrue(e.getOriginalMessage().startsWith("Duplicate field 'n'"), e.getOriginalMessage());
        assertEquals(3, e.getLocation().getLineNr());
    }

    @Test
    void textAfterTheValueIsRefusedStrictlyAndIgnoredLeniently() throws IOException {
        JsonParseException e = assertThrows(JsonParseException.class, () -> JsonTree.strict("{\"n\": 1} {}"));
        assertTrue(e.getOriginalMessage().startsWith("Trailing token (of type START_OBJECT)"), e.getOriginalMessage());
        assertEquals(1, JsonTree.lenient("{\"n\": 1} {}").path("n").intValue());
    }

    @Test
    void emptyTextIsTheMissingNodeAsTheMapperReadsIt() throws IOException {
        assertEquals(MAPPER.readTree(""), JsonTree.strict(""));
        assertTrue(JsonTree.strict("  ").isMissingNode());
    }

    @Test
    void numbersKeepTheMappersTypes() throws IOException {
        JsonNode tree = JsonTree.strict("[1, 3000000000, 123456789012345678901234567890, 0.1, 1e-7, -0.0]");
        assertEquals(MAPPER.readTree("[1, 3000000000, 123456789012345678901234567890, 0.1, 1e-7, -0.0]"), tree);
        assertTrue(tree.get(0).isInt() && tree.get(1).isLong() && tree.get(2).isBigInteger() && tree.get(3).isDouble());
    }

    /** The canonical order as the mapper wrote it before: maps sorted by name, at every level. */
    private static Object sortedByMapper(JsonNode node) {
        if (node.isObject()) {
            Map<String, Object> map = new TreeMap<>();
            node.properties().forEach(e -> map.put(e.getKey(), sortedByMapper(e.getValue())));
            return map;
        }
        if (node.isArray()) {
            List<Object> list = new ArrayList<>();
            node.forEach(element -> list.add(sortedByMapper(element)));
            return list;
        }
        return node;
    }

    @Provide
    Arbitrary<JsonNode> trees() {
        return tree(3);
    }

    @Provide
    Arbitrary<JsonNode> plainTrees() {
        // Control characters, quotes, backslashes, slashes, Latin-1, line separators, an emoji and a lone surrogate.
        Arbitrary<String> text = Arbitraries.strings().withCharRange('\u0000', '\u00ff')
                .withChars('\u2028', '\u2029', '\ud83d', '\ude00', '\ud800', '\u202e').ofMaxLength(12);
        JsonNodeFactory nodes = JsonNodeFactory.instance;
        return tree(3, Arbitraries.oneOf(
                Arbitraries.integers().map(nodes::numberNode),
                Arbitraries.longs().map(nodes::numberNode),
                text.map(nodes::textNode),
                Arbitraries.of(true, false).map(nodes::booleanNode),
                Arbitraries.just(nodes.nullNode())), text);
    }

    private static Arbitrary<JsonNode> tree(int depth) {
        JsonNodeFactory nodes = JsonNodeFactory.instance;
        return tree(depth, Arbitraries.oneOf(
                Arbitraries.integers().map(nodes::numberNode),
                Arbitraries.longs().map(nodes::numberNode),
                Arbitraries.doubles().map(nodes::numberNode),
                Arbitraries.strings().ofMaxLength(12).map(nodes::textNode),
                Arbitraries.of(true, false).map(nodes::booleanNode),
                Arbitraries.just(nodes.nullNode())), Arbitraries.strings().alpha().ofMaxLength(6));
    }

    private static Arbitrary<JsonNode> tree(int depth, Arbitrary<JsonNode> leaf, Arbitrary<String> names) {
        JsonNodeFactory nodes = JsonNodeFactory.instance;
        if (depth == 0) {
            return leaf;
        }
        Arbitrary<JsonNode> inner = tree(depth - 1, leaf, names);
        Arbitrary<JsonNode> array = inner.list().ofMaxSize(4).map(elements -> {
            ArrayNode a = nodes.arrayNode();
            elements.forEach(a::add);
            return a;
        });
        Arbitrary<JsonNode> object = Arbitraries.maps(names, inner)
                .ofMaxSize(4).map(fields -> {
                    ObjectNode o = nodes.objectNode();
                    fields.forEach(o::set);
                    return o;
                });
        return Arbitraries.frequencyOf(
                net.jqwik.api.Tuple.of(3, leaf), net.jqwik.api.Tuple.of(1, array), net.jqwik.api.Tuple.of(1, object));
    }
}
