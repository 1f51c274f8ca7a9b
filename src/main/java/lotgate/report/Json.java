package lotgate.report;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import lotgate.files.JsonTree;

/** JSON output: one indented object per command. */
public final class Json {
    private Json() {
    }

    public static ObjectNode object() {
        return JsonNodeFactory.instance.objectNode();
    }

    public static String text(ObjectNode node) {
        return JsonTree.indented(node);
    }
}
