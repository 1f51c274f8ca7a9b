package lotgate.web;

/** A refusal about one field of a form, in the words the command would use; answered as JSON (400). */
final class FieldError extends Exchange.Refusal {
    private static final long serialVersionUID = 1L;
    private final String field;

    FieldError(String field, String message) {
        super(400, message);
        this.field = field;
    }

    String field() {
        return field;
    }

    @Override
    Reply reply() {
        return JsonText.refused(status(), field, getMessage());
    }
}
