package lotgate.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** JSON output: one indented object per command. */
public final class Json {
    /** Built on first printing only: a command may assemble its JSON object and then print text. */
    private static final class Printer {
        static final ObjectMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();
    }

    private Json() {
    }

    public static ObjectNode object() {
        return JsonNodeFactory.instance.objectNode();
    }

    public static String text(ObjectNode node) {
        try {
            return Printer.MAPPER.writeValueAsString(node);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
