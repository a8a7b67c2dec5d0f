package org.telltale;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/** Reads an enum value by its key, the one way every enum parser does it. */
public final class EnumKeys {
    private EnumKeys() {
    }

    /**
     * The value of {@code values} whose key is {@code key}.
     *
     * @param what the kind of value, as the error message names it
     * @throws UnknownKeyException for any other key (also for {@code null}), listing the accepted keys in order
     */
    public static <E extends Enum<E>> E parse(String what, String key, E[] values, Function<E, String> keyOf) {
        List<String> accepted = new ArrayList<>(values.length);
        for (E value : values) {
            String k = keyOf.apply(value);
            if (k.equals(key)) {
                return value;
            }
            accepted.add(k);
        }
        throw new UnknownKeyException(what, key, accepted);
    }
}
