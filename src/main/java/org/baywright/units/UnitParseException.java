package org.baywright.units;

/**
 * Text that is not a valid quantity. The message names the field, quotes the text and lists the
 * accepted forms, e.g. {@code span: "35 yd" is not a length; use 35ft, 30'-6", 420in, 10.5m or 250mm}.
 */
public final class UnitParseException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String field;
    private final String text;
    private final String accepted;

    public UnitParseException(String field, String text, String problem, String accepted) {
        super(field + ": \"" + text + "\" " + problem + "; use " + accepted);
        this.field = field;
        this.text = text;
        this.accepted = accepted;
    }

    public String field() {
        return field;
    }

    public String text() {
        return text;
    }

    public String accepted() {
        return accepted;
    }
}
