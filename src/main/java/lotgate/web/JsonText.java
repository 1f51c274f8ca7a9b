package lotgate.web;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** JSON answers of the workbench, and the shape of a refusal: {ok: false, errors: [{field, message}]}. */
final class JsonText {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private JsonText() {
    }

    static String of(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** A successful answer: ok true and the given members, in order. */
    static Reply ok(Map<String, ?> members) {
        Map<String, Object> all = new LinkedHashMap<>();
        all.put("ok", true);
        all.putAll(members);
        return Reply.json(200, of(all));
    }

    /** A refusal about one field (null: the whole request) in the words the command would use. */
    static Reply refused(int status, String field, String message) {
        List<Map<String, Object>> errors = new ArrayList<>();
        Map<String, Object> error = new LinkedHashMap<>();
        error.put("field", field);
        error.put("message", message);
        errors.add(error);
        Map<String, Object> all = new LinkedHashMap<>();
        all.put("ok", false);
        all.put("errors", errors);
        return Reply.json(status, of(all));
    }
}
