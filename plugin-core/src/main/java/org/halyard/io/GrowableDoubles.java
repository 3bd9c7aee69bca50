package org.halyard.io;

import java.util.Arrays;

/** An append-only primitive double column that grows by half its size; {@link #toArray()} trims it. */
final class GrowableDoubles {

    private double[] data;
    private int size;

    GrowableDoubles(int capacity) {
        data = new double[Math.max(16, capacity)];
    }

    void add(double v) {
        if (size == data.length) {
            data = Arrays.copyOf(data, data.length + (data.length >> 1));
        }
        data[size++] = v;
    }

    int size() {
        return size;
    }

    double get(int i) {
        return data[i];
    }

    /** The values, trimmed to size (the internal array itself when it is already exact). */
    double[] toArray() {
        if (data.length != size) {
            data = Arrays.copyOf(data, size);
        }
        return data;
    }

    /** The values as floats (for quantities whose precision needs no more), trimmed to size. */
    float[] toFloatArray() {
        float[] f = new float[size];
        for (int i = 0; i < size; i++) {
            f[i] = (float) data[i];
        }
        data = null;
        return f;
    }
}
