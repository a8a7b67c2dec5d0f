package org.telltale.audit;

import java.util.Arrays;

/** One small label index per corpus position, in two bytes a document: the corpus's predictions without its texts. */
final class LabelColumn {
    private short[] values = new short[1024];
    private int size;

    void add(int labelIndex) {
        if (size == values.length) {
            values = Arrays.copyOf(values, size * 2);
        }
        values[size++] = (short) labelIndex;
    }

    int get(int position) {
        if (position >= size) {
            throw new IndexOutOfBoundsException("position " + position + " of " + size);
        }
        return values[position];
    }

    int size() {
        return size;
    }
}
