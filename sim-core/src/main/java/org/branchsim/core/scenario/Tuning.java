package org.branchsim.core.scenario;

import java.util.Set;

/**
 * What a field means to a fluid-power engineer curing hunting or chatter: the field is a remedy and tuning
 * candidate, searched over a range around its value, with the words of the trade for raising and lowering it.
 * The ranges and the directions that help damping are common practice, no source: the cures named in the
 * trade are to resize the damping orifice, change the spring-chamber volume, damp the main spool or the pilot
 * poppet, stiffen the pilot spring, meter through slots, damp a relief poppet, add or remove volume at a node.
 *
 * @param rank order among the candidates of one element or node (lower first): the order remedies are tried
 * @param members the moving members or parts of the element this candidate acts on ({@code spool},
 *        {@code pilot}, {@code end}); empty when it acts on the element whatever part takes part
 * @param lowFactor lowest value searched, as a factor of the current value
 * @param highFactor highest value searched, as a factor of the current value
 * @param absoluteLow lowest value searched when the current value is zero or not written, SI; NaN when the
 *        field is a candidate only when written with a value above zero
 * @param absoluteHigh highest value searched when the current value is zero or not written, SI (NaN likewise)
 * @param helps which change of the value helps damping
 * @param metricUnit symbol new values are written in for a metric scenario
 * @param usUnit symbol new values are written in for a US customary scenario
 * @param raiseWords what raising the value means on hardware; {@code %s} stands for the new value with its
 *        unit and <code>{id}</code> for the element's or node's id
 * @param lowerWords what lowering it means on hardware, with the same placeholders
 */
public record Tuning(int rank, Set<String> members, double lowFactor, double highFactor, double absoluteLow,
                     double absoluteHigh, Direction helps, String metricUnit, String usUnit, String raiseWords,
                     String lowerWords) {

    /** Range of a damping coefficient, as factors of its value. */
    public static final double[] DAMPING_RANGE = {0.3, 20.0};
    /** Range of a volume, as factors of its value. */
    public static final double[] VOLUME_RANGE = {0.25, 4.0};
    /** Range of an orifice diameter or a spring rate, as factors of its value. */
    public static final double[] SIZE_RANGE = {0.5, 2.0};

    /** Which change of a value helps damping. */
    public enum Direction {
        /** Raising the value adds damping. */
        RAISE("raise"),
        /** Lowering the value adds damping. */
        LOWER("lower"),
        /** It depends on the circuit: searched both ways. */
        EITHER("either way");

        private final String words;

        Direction(String words) {
            this.words = words;
        }

        /** @return the direction in words, e.g. "raise" */
        public String words() {
            return words;
        }
    }

    /** Copies the member set. */
    public Tuning {
        members = Set.copyOf(members);
    }

    /**
     * A damping coefficient: scaled over {@link #DAMPING_RANGE} when set, over an absolute range when zero or
     * not written; raising it damps.
     *
     * @param rank order among the element's candidates
     * @param members members it acts on (empty: any)
     * @param absoluteLow lowest value when zero, SI
     * @param absoluteHigh highest value when zero, SI
     * @param name what it is in words, e.g. "pilot damping" (lowering reads "less pilot damping, about %s")
     * @param metricUnit unit for metric scenarios
     * @param usUnit unit for US customary scenarios
     * @param raiseWords hardware words for raising it
     * @return the tuning
     */
    public static Tuning damping(int rank, Set<String> members, double absoluteLow, double absoluteHigh, String name,
                                 String metricUnit, String usUnit, String raiseWords) {
        return new Tuning(rank, members, DAMPING_RANGE[0], DAMPING_RANGE[1], absoluteLow, absoluteHigh,
                Direction.RAISE, metricUnit, usUnit, raiseWords, "less " + name + ", about %s");
    }

    /**
     * A size searched by factors of its written value, only when it is written and above zero.
     *
     * @param rank order among the element's candidates
     * @param members members it acts on (empty: any)
     * @param range lowest and highest factor
     * @param helps which change helps damping
     * @param metricUnit unit for metric scenarios
     * @param usUnit unit for US customary scenarios
     * @param raiseWords hardware words for raising it
     * @param lowerWords hardware words for lowering it
     * @return the tuning
     */
    public static Tuning scaled(int rank, Set<String> members, double[] range, Direction helps, String metricUnit,
                                String usUnit, String raiseWords, String lowerWords) {
        return new Tuning(rank, members, range[0], range[1], Double.NaN, Double.NaN, helps, metricUnit, usUnit,
                raiseWords, lowerWords);
    }

    /** @return true when the field is searched over an absolute range when zero or not written */
    public boolean searchedFromZero() {
        return !Double.isNaN(absoluteLow);
    }

    /** @return true when the candidate acts on this member of its element ("" for the element as a whole) */
    public boolean actsOn(String member) {
        return members.isEmpty() || members.contains(member);
    }

    /** @return the hardware words with the owner's id filled in */
    public String raiseWords(String ownerId) {
        return raiseWords.replace("{id}", ownerId);
    }

    /** @return the hardware words with the owner's id filled in */
    public String lowerWords(String ownerId) {
        return lowerWords.replace("{id}", ownerId);
    }
}
