package org.telltale.connect;

/** A short, one-line excerpt of a response body for error messages. */
final class Snippet {
    static final int LIMIT = 200;

    private Snippet() {
    }

    static String of(String body) {
        if (body == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(Math.min(body.length(), LIMIT) + 24);
        int n = Math.min(body.length(), LIMIT);
        for (int i = 0; i < n; i++) {
            char c = body.charAt(i);
            sb.append(Character.isISOControl(c) ? ' ' : c);
        }
        if (body.length() > LIMIT) {
            sb.append("… (").append(body.length()).append(" chars)");
        }
        return sb.toString();
    }

    static String of(byte[] body) {
        return of(new String(body, java.nio.charset.StandardCharsets.UTF_8));
    }
}
