package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A scenario document as a tree that remembers where every value stood in the file (1-based line and
 * column), so that a problem found after parsing can still point at its place. Built by
 * {@link DocumentParser} from Jackson's streaming parser (JSON or YAML).
 */
public abstract sealed class Located permits Located.Obj, Located.Arr, Located.Scalar {

    private final int line;
    private final int column;

    Located(int line, int column) {
        this.line = line;
        this.column = column;
    }

    /** @return 1-based line of the value */
    public int line() {
        return line;
    }

    /** @return 1-based column of the value */
    public int column() {
        return column;
    }

    /** @return a short description of what the value is, for "found ..." in messages */
    public abstract String describe();

    /** @return a deep copy */
    public abstract Located copy();

    /** An object: keys in file order. */
    public static final class Obj extends Located {
        private final Map<String, Located> fields = new LinkedHashMap<>();
        private final Map<String, int[]> keyLocations = new LinkedHashMap<>();

        Obj(int line, int column) {
            super(line, column);
        }

        void put(String key, Located value, int keyLine, int keyColumn) {
            fields.put(key, value);
            keyLocations.put(key, new int[] {keyLine, keyColumn});
        }

        /** Replaces or adds a field (used by sweeps), keeping the old location when there is one. */
        public void set(String key, Located value) {
            fields.put(key, value);
            keyLocations.putIfAbsent(key, new int[] {value.line(), value.column()});
        }

        /** @return the value of a key, or null */
        public Located get(String key) {
            return fields.get(key);
        }

        /** @return the keys in file order */
        public List<String> keys() {
            return new ArrayList<>(fields.keySet());
        }

        /** @return where a key was written: {line, column} */
        public int[] keyLocation(String key) {
            return keyLocations.getOrDefault(key, new int[] {line(), column()});
        }

        @Override
        public String describe() {
            return "an object";
        }

        @Override
        public Obj copy() {
            Obj o = new Obj(line(), column());
            for (Map.Entry<String, Located> e : fields.entrySet()) {
                int[] at = keyLocations.get(e.getKey());
                o.put(e.getKey(), e.getValue().copy(), at[0], at[1]);
            }
            return o;
        }
    }

    /** An array. */
    public static final class Arr extends Located {
        private final List<Located> items = new ArrayList<>();

        Arr(int line, int column) {
            super(line, column);
        }

        void add(Located value) {
            items.add(value);
        }

        /** @return the items */
        public List<Located> items() {
            return Collections.unmodifiableList(items);
        }

        @Override
        public String describe() {
            return "a list";
        }

        @Override
        public Arr copy() {
            Arr a = new Arr(line(), column());
            for (Located item : items) {
                a.add(item.copy());
            }
            return a;
        }
    }

    /** A string, number, boolean or null. */
    public static final class Scalar extends Located {
        private final Object value;

        /**
         * @param value a String, Double, Long, Boolean or null
         * @param line 1-based line
         * @param column 1-based column
         */
        public Scalar(Object value, int line, int column) {
            super(line, column);
            this.value = value;
        }

        /** @return the value: String, Double, Long, Boolean or null */
        public Object value() {
            return value;
        }

        /** @return true for a JSON string */
        public boolean isText() {
            return value instanceof String;
        }

        /** @return true for a JSON number */
        public boolean isNumber() {
            return value instanceof Number;
        }

        @Override
        public String describe() {
            if (value == null) {
                return "null";
            }
            if (value instanceof String s) {
                return "\"" + s + "\"";
            }
            if (value instanceof Double d && d == Math.rint(d) && Math.abs(d) < 1e15) {
                return Long.toString(d.longValue());
            }
            return value.toString();
        }

        @Override
        public Scalar copy() {
            return this;
        }
    }
}
