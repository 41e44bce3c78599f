package org.branchsim.core.scenario;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import org.branchsim.core.units.Units;

/**
 * One field of a scenario object, declared once: its name, what kind of value it holds (a dimensioned
 * value, a plain number, a text, one of fixed words, a nested block, a list), its dimension and bounds, its
 * default, a one-line meaning, whether a schedule may change it, and whether it is a remedy and tuning
 * candidate. The reader, the parameter paths of studies, the remedy candidates, the field reference of
 * docs/scenario-format.md and the JSON Schema are all derived from these declarations. Values are SI inside.
 * Instances are immutable; the {@code with...} methods return changed copies.
 */
public final class FieldSpec {

    /** What kind of value a field holds. */
    public enum Kind {
        /** A dimensioned value written as text with its unit, e.g. "0.8 mm". */
        QUANTITY,
        /** A plain number (dimensionless) within bounds; a text such as "0.5 %" is read too. */
        NUMBER,
        /** A free text, optionally matching a pattern. */
        TEXT,
        /** One of a fixed set of words. */
        CHOICE,
        /** A nested object with its own fields. */
        BLOCK,
        /** A list of nested objects of one kind. */
        BLOCK_LIST,
        /** A list of texts. */
        TEXT_LIST,
        /** The list of nodes, each of a node kind chosen by its "type". */
        NODE_LIST,
        /** The list of elements, each of an element type chosen by its "type". */
        ELEMENT_LIST,
        /** A number or a dimensioned value whose dimension another field decides (a schedule's "to"). */
        SCHEDULED_VALUE
    }

    /** Which values a dimensioned field allows besides its bounds. */
    public enum Sign {
        /** Any value within the bounds. */
        ANY(""),
        /** Values above zero. */
        POSITIVE(" > 0"),
        /** Zero or above. */
        NON_NEGATIVE(" ≥ 0");

        private final String text;

        Sign(String text) {
            this.text = text;
        }

        /** @return the rule in symbols for the field reference, e.g. " > 0" */
        public String text() {
            return text;
        }
    }

    /**
     * A word a {@link Kind#CHOICE} field accepts.
     *
     * @param word the word as written
     * @param gloss a short explanation shown in messages, e.g. "bar, L/min, mm" (empty for none)
     */
    public record Word(String word, String gloss) {
    }

    private String name;
    private Kind kind;
    private Dimension dimension = Dimension.DIMENSIONLESS;
    private Sign sign = Sign.ANY;
    private double min = Double.NEGATIVE_INFINITY;
    private double max = Double.POSITIVE_INFINITY;
    private boolean required;
    private double defaultSi = Double.NaN;
    private String defaultText;
    private boolean literalDefault;
    private String meaning = "";
    private boolean schedulable;
    private Tuning tuning;
    private BlockSpec block;
    private List<Word> words = List.of();
    private boolean anyCase;
    private Map<String, String> oldWords = Map.of();
    private String oldWordReason = "";
    private String pattern;
    private String patternText;
    private int maxLength;
    private int minItems;

    private FieldSpec(String name, Kind kind) {
        this.name = name;
        this.kind = kind;
    }

    private FieldSpec copy() {
        FieldSpec f = new FieldSpec(name, kind);
        f.dimension = dimension;
        f.sign = sign;
        f.min = min;
        f.max = max;
        f.required = required;
        f.defaultSi = defaultSi;
        f.defaultText = defaultText;
        f.literalDefault = literalDefault;
        f.meaning = meaning;
        f.schedulable = schedulable;
        f.tuning = tuning;
        f.block = block;
        f.words = words;
        f.anyCase = anyCase;
        f.oldWords = oldWords;
        f.oldWordReason = oldWordReason;
        f.pattern = pattern;
        f.patternText = patternText;
        f.maxLength = maxLength;
        f.minItems = minItems;
        return f;
    }

    /** @return a required dimensioned field of any sign */
    public static FieldSpec quantity(String name, Dimension dimension) {
        FieldSpec f = new FieldSpec(name, Kind.QUANTITY);
        f.dimension = dimension;
        f.required = true;
        return f;
    }

    /** @return a required dimensioned field whose value must be above zero */
    public static FieldSpec positive(String name, Dimension dimension) {
        FieldSpec f = quantity(name, dimension);
        f.sign = Sign.POSITIVE;
        return f;
    }

    /** @return a required dimensioned field whose value must be zero or more */
    public static FieldSpec nonNegative(String name, Dimension dimension) {
        FieldSpec f = quantity(name, dimension);
        f.sign = Sign.NON_NEGATIVE;
        return f;
    }

    /**
     * @param name field name
     * @param min lowest value
     * @param max highest value
     * @param defaultValue value when absent
     * @return an optional plain number from min to max
     */
    public static FieldSpec number(String name, double min, double max, double defaultValue) {
        FieldSpec f = new FieldSpec(name, Kind.NUMBER);
        f.min = min;
        f.max = max;
        f.defaultSi = defaultValue;
        f.defaultText = plain(defaultValue);
        f.literalDefault = true;
        return f;
    }

    /** @return a required text field */
    public static FieldSpec text(String name) {
        FieldSpec f = new FieldSpec(name, Kind.TEXT);
        f.required = true;
        return f;
    }

    /**
     * @param name field name
     * @param words the words accepted, the first being the default unless {@link #byDefault} says otherwise
     * @return an optional field holding one of the words (default: the first)
     */
    public static FieldSpec choice(String name, Word... words) {
        FieldSpec f = new FieldSpec(name, Kind.CHOICE);
        f.words = List.of(words);
        f.defaultText = "\"" + words[0].word() + "\"";
        f.literalDefault = true;
        return f;
    }

    /** @return a word without gloss for {@link #choice} */
    public static Word word(String word) {
        return new Word(word, "");
    }

    /** @return a word with a gloss for {@link #choice} */
    public static Word word(String word, String gloss) {
        return new Word(word, gloss);
    }

    /** @return an optional nested object */
    public static FieldSpec block(String name, BlockSpec block) {
        FieldSpec f = new FieldSpec(name, Kind.BLOCK);
        f.block = block;
        return f;
    }

    /** @return an optional list of nested objects of one kind */
    public static FieldSpec blockList(String name, BlockSpec items) {
        FieldSpec f = new FieldSpec(name, Kind.BLOCK_LIST);
        f.block = items;
        return f;
    }

    /** @return an optional list of texts */
    public static FieldSpec textList(String name) {
        return new FieldSpec(name, Kind.TEXT_LIST);
    }

    /** @return a field of one of the catalogue-driven kinds (node list, element list, scheduled value) */
    public static FieldSpec special(String name, Kind kind) {
        return new FieldSpec(name, kind);
    }

    /** @return a copy that may be left out (no default value: the reader decides, e.g. "none") */
    public FieldSpec optional() {
        FieldSpec f = copy();
        f.required = false;
        return f;
    }

    /** @return a copy that must be present */
    public FieldSpec required() {
        FieldSpec f = copy();
        f.required = true;
        return f;
    }

    /**
     * @param text the default as a scenario writes it, e.g. "0 N*s/m" for a quantity, a word for a choice
     * @return an optional copy with that default
     */
    public FieldSpec byDefault(String text) {
        FieldSpec f = copy();
        f.required = false;
        f.literalDefault = true;
        if (kind == Kind.QUANTITY) {
            f.defaultSi = Quantity.si(text, dimension);
        }
        f.defaultText = "\"" + text + "\"";
        return f;
    }

    /**
     * @param siValue the default in SI units
     * @param text how the reference shows it, e.g. "π × diameter" or "0.611 (π/(π+2))"
     * @return an optional copy whose default is computed or is not a value a scenario would write
     */
    public FieldSpec computedDefault(double siValue, String text) {
        FieldSpec f = copy();
        f.required = false;
        f.literalDefault = false;
        f.defaultSi = siValue;
        f.defaultText = text;
        return f;
    }

    /** @return a copy with a one-line meaning */
    public FieldSpec meaning(String text) {
        FieldSpec f = copy();
        f.meaning = text;
        return f;
    }

    /** @return a copy that a schedule may change as {@code <id>.<name>} */
    public FieldSpec schedulable() {
        FieldSpec f = copy();
        f.schedulable = true;
        return f;
    }

    /** @return a copy that is a remedy and tuning candidate */
    public FieldSpec tuning(Tuning t) {
        FieldSpec f = copy();
        f.tuning = t;
        return f;
    }

    /**
     * @param regex the pattern the whole text must match (Java and ECMA-262 alike)
     * @param text the pattern in words, for messages and the reference
     * @param longest longest text accepted (0: no limit)
     * @return a copy with that pattern
     */
    public FieldSpec pattern(String regex, String text, int longest) {
        FieldSpec f = copy();
        f.pattern = regex;
        f.patternText = text;
        f.maxLength = longest;
        return f;
    }

    /** @return a copy whose words are matched in any case */
    public FieldSpec anyCase() {
        FieldSpec f = copy();
        f.anyCase = true;
        return f;
    }

    /**
     * @param oldToNew old spellings still accepted, each with the word it now is
     * @param reason why the name changed, written after the names in the note, e.g. " (bar is not SI)"
     * @return a copy that accepts the old spellings with a note
     */
    public FieldSpec oldWords(Map<String, String> oldToNew, String reason) {
        FieldSpec f = copy();
        f.oldWords = new LinkedHashMap<>(oldToNew);
        f.oldWordReason = reason;
        return f;
    }

    /** @return a copy that needs at least this many items (a list) */
    public FieldSpec minItems(int count) {
        FieldSpec f = copy();
        f.minItems = count;
        return f;
    }

    /** @return the field name */
    public String name() {
        return name;
    }

    /** @return the kind of value */
    public Kind kind() {
        return kind;
    }

    /** @return the dimension (DIMENSIONLESS for plain numbers and non-numeric kinds) */
    public Dimension dimension() {
        return dimension;
    }

    /** @return which values besides the bounds are allowed (quantities) */
    public Sign sign() {
        return sign;
    }

    /** @return lowest value of a plain number */
    public double min() {
        return min;
    }

    /** @return highest value of a plain number */
    public double max() {
        return max;
    }

    /**
     * @return the bounds of a dimensioned field ({@link FieldBounds}: its own row, else its dimension's), or
     *         null for other kinds
     */
    public FieldBounds.Range bounds() {
        return kind == Kind.QUANTITY ? FieldBounds.of(name, dimension) : null;
    }

    /** @return true when the field must be written (within its alternative, when it belongs to one) */
    public boolean isRequired() {
        return required;
    }

    /** @return the default in SI (plain numbers: the number), NaN when none or not a number */
    public double defaultSi() {
        return defaultSi;
    }

    /** @return the default as the reference shows it, or null when there is none */
    public String defaultText() {
        return defaultText;
    }

    /** @return true when the default is a value a scenario would write (the schema's "default") */
    public boolean hasLiteralDefault() {
        return literalDefault;
    }

    /** @return the one-line meaning */
    public String meaning() {
        return meaning;
    }

    /** @return true when a schedule may change the value */
    public boolean isSchedulable() {
        return schedulable;
    }

    /** @return the remedy and tuning role, or null when the field is not a candidate */
    public Tuning tuning() {
        return tuning;
    }

    /** @return the nested block (BLOCK) or item block (BLOCK_LIST), else null */
    public BlockSpec block() {
        return block;
    }

    /** @return the accepted words (CHOICE) */
    public List<Word> words() {
        return words;
    }

    /** @return true when words are matched in any case */
    public boolean isAnyCase() {
        return anyCase;
    }

    /** @return old spellings still accepted, with their new words */
    public Map<String, String> oldWords() {
        return oldWords;
    }

    /** @return why the words changed, written after the names in the note */
    public String oldWordReason() {
        return oldWordReason;
    }

    /** @return the pattern a text must match, or null */
    public String pattern() {
        return pattern;
    }

    /** @return the pattern in words, or null */
    public String patternText() {
        return patternText;
    }

    /** @return longest text accepted, 0 for no limit */
    public int maxLength() {
        return maxLength;
    }

    /** @return fewest items of a list */
    public int minItems() {
        return minItems;
    }

    /**
     * @param written the word as written
     * @return the accepted word it stands for (case folded when any case is allowed; an old spelling's new
     *         word), or null when it is not accepted
     */
    public String wordFor(String written) {
        for (Word w : words) {
            if (anyCase ? w.word().equalsIgnoreCase(written) : w.word().equals(written)) {
                return w.word();
            }
        }
        for (Map.Entry<String, String> e : oldWords.entrySet()) {
            if (anyCase ? e.getKey().equalsIgnoreCase(written) : e.getKey().equals(written)) {
                return e.getValue();
            }
        }
        return null;
    }

    /** @return the accepted words for messages: {@code "a" or "b"}, or {@code one of "a", "b", "c"} */
    public String wordsText() {
        List<String> each = words.stream()
                .map(w -> "\"" + w.word() + "\"" + (w.gloss().isEmpty() ? "" : " (" + w.gloss() + ")")).toList();
        return each.size() == 2 ? each.get(0) + " or " + each.get(1) : "one of " + String.join(", ", each);
    }

    /** @return a number as the reference writes it, e.g. 1e-6 (no leading zeros in the exponent) */
    static String plain(double value) {
        return Units.plain(value).replaceAll("e([-+]?)0+(\\d)", "e$1$2");
    }

    @Override
    public String toString() {
        return name + " (" + kind + ")";
    }
}
