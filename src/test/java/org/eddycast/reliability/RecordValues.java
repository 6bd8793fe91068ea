package org.eddycast.reliability;

import java.lang.reflect.RecordComponent;
import java.util.Arrays;
import java.util.List;

/** Deep equality of record values, arrays compared element by element (records compare arrays by reference). */
final class RecordValues {

    private RecordValues() {
    }

    /** A description of the first difference between two values, or null when they are equal. */
    static String difference(Object a, Object b, String path) {
        if (a == b) {
            return null;
        }
        if (a == null || b == null || a.getClass() != b.getClass()) {
            return path + ": " + a + " vs " + b;
        }
        if (a instanceof double[] x) {
            return Arrays.equals(x, (double[]) b) ? null : path + ": " + Arrays.toString(x) + " vs "
                    + Arrays.toString((double[]) b);
        }
        if (a instanceof List<?> x) {
            List<?> y = (List<?>) b;
            if (x.size() != y.size()) {
                return path + ": sizes " + x.size() + " vs " + y.size();
            }
            for (int i = 0; i < x.size(); i++) {
                String d = difference(x.get(i), y.get(i), path + "[" + i + "]");
                if (d != null) {
                    return d;
                }
            }
            return null;
        }
        if (a.getClass().isRecord()) {
            for (RecordComponent c : a.getClass().getRecordComponents()) {
                try {
                    String d = difference(c.getAccessor().invoke(a), c.getAccessor().invoke(b), path + "." + c.getName());
                    if (d != null) {
                        return d;
                    }
                } catch (ReflectiveOperationException e) {
                    throw new IllegalStateException(e);
                }
            }
            return null;
        }
        return a.equals(b) ? null : path + ": " + a + " vs " + b;
    }
}
