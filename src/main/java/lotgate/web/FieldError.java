package lotgate.web;

/** A refusal about one field of a form, in the words the command would use; answered as JSON (400). */
final class FieldError extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final String field;

    FieldError(String field, String message) {
        super(message, null, false, false);
        this.field = field;
    }

    String field() {
        return field;
    }

    Reply reply() {
        return JsonText.refused(400, field, getMessage());
    }
}
