package org.telltale.text;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * Picks id, text and label out of a JSON object and checks their types: text must be a string;
 * id a string or an integer; label a string, an integer or a boolean (0/1 and true/false labels
 * are common). JSON {@code null} counts as absent.
 */
final class RecordFields {
    private final String idField;
    private final String textField;
    private final String labelField;

    RecordFields(CorpusSettings settings) {
        this.idField = settings.idField();
        this.textField = settings.textField();
        this.labelField = settings.labelField();
    }

    String idField() {
        return idField;
    }

    String textField() {
        return textField;
    }

    String labelField() {
        return labelField;
    }

    /** The id, or {@code null} when absent (the reader then derives one from the position). */
    String id(JsonNode value, String place) {
        if (value == null || value.isNull()) {
            return null;
        }
        if (value.isTextual() || value.isIntegralNumber()) {
            String id = value.asText();
            if (id.isEmpty()) {
                throw new BadRecord(SkipReason.MISTYPED_FIELD, place + ": field '" + idField + "' is an empty string");
            }
            return id;
        }
        throw new BadRecord(SkipReason.MISTYPED_FIELD, place + ": field '" + idField + "' must be a string or an integer, got " + kind(value));
    }

    String text(JsonNode value, String place) {
        if (value == null || value.isNull()) {
            throw new BadRecord(SkipReason.MISSING_TEXT, place + ": no field '" + textField + "'"
                    + (value == null ? "" : " (it is null)") + "; choose the text field with {textField}");
        }
        if (!value.isTextual()) {
            throw new BadRecord(SkipReason.MISTYPED_FIELD, place + ": field '" + textField + "' must be a string, got " + kind(value));
        }
        return value.textValue();
    }

    String label(JsonNode value, String place) {
        if (value == null || value.isNull()) {
            return null;
        }
        if (value.isTextual() || value.isIntegralNumber() || value.isBoolean()) {
            return value.asText();
        }
        throw new BadRecord(SkipReason.MISTYPED_FIELD, place + ": field '" + labelField
                + "' must be a string, an integer or a boolean, got " + kind(value));
    }

    static String kind(JsonNode node) {
        return switch (node.getNodeType()) {
            case ARRAY -> "an array";
            case OBJECT -> "an object";
            case NUMBER -> "a number";
            case BOOLEAN -> "a boolean";
            case STRING -> "a string";
            case NULL, MISSING -> "null";
            default -> node.getNodeType().name().toLowerCase(java.util.Locale.ROOT);
        };
    }
}
