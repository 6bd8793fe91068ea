package org.eddycast.scenario;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.exc.StreamReadException;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Locale;

/**
 * The message for a key given twice in one JSON object, which the strict parser refuses (a lenient one would
 * keep the last value without a word): the field's path as the reader names fields, and the line.
 */
final class DuplicateKeys {

    private static final String JACKSON_PREFIX = "Duplicate field '";

    private DuplicateKeys() {
    }

    /** The message for a duplicate-key failure, or null when {@code e} is another syntax error. */
    static String describe(JsonProcessingException e) {
        String original = e.getOriginalMessage();
        if (original == null || !original.startsWith(JACKSON_PREFIX)) {
            return null;
        }
        String key = original.substring(JACKSON_PREFIX.length(), original.lastIndexOf('\''));
        String path = key;
        if (e instanceof StreamReadException s && s.getProcessor() != null) {
            path = join(s.getProcessor().getParsingContext(), key);
        }
        JsonLocation at = e.getLocation();
        String where = at == null ? "" : String.format(Locale.ROOT, "line %d, column %d: ", at.getLineNr(),
                at.getColumnNr());
        return where + Printable.escape(path) + " is given twice; keep one value (a repeated field would "
                + "silently replace the first)";
    }

    private static String join(JsonStreamContext context, String key) {
        Deque<String> names = new ArrayDeque<>();
        names.push(key);
        for (JsonStreamContext c = context == null ? null : context.getParent(); c != null; c = c.getParent()) {
            if (c.inObject() && c.getCurrentName() != null) {
                names.push(c.getCurrentName());
            } else if (c.inArray()) {
                names.push("[" + c.getCurrentIndex() + "]");
            }
        }
        return String.join(".", names).replace(".[", "[");
    }
}
