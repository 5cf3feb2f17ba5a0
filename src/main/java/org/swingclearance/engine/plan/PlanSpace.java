package org.swingclearance.engine.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The grid of plan states: clubs in mass order × grip marks every 2.5 cm from the knob end up to each club's handle
 * length × cycle-time rungs. States are also numbered by "slot" for the search's flat arrays; a slot whose grip mark
 * lies beyond its club's handle is not a state.
 */
public final class PlanSpace {

    /** Grid of grip marks (engine.md §7). */
    public static final double GRIP_STEP_M = 0.025;

    /** Grip marks are counted in tenths of a millimetre so that k × 2.5 cm is exact for the grid test. */
    private static final long GRIP_STEP_TENTH_MM = 250;
    private static final double GRID_TOLERANCE_M = 1e-9;

    private final List<ClubOption> clubs;
    private final CycleTimeLadder ladder;
    private final int[] gripMarkCounts;
    private final int maxGripMarks;
    private final int stateCount;

    /** Clubs may come in any order; they are sorted by mass (then id), so neighbouring clubs differ least in mass. */
    public PlanSpace(List<ClubOption> inventory, CycleTimeLadder ladder) {
        if (inventory == null || inventory.isEmpty()) {
            throw new IllegalArgumentException("A plan needs at least one club.");
        }
        if (ladder == null) {
            throw new IllegalArgumentException("A plan needs a cycle-time ladder.");
        }
        List<ClubOption> sorted = new ArrayList<>(inventory);
        sorted.sort(Comparator.comparingDouble(ClubOption::massKg).thenComparing(ClubOption::id));
        Set<String> ids = new HashSet<>();
        for (ClubOption club : sorted) {
            if (!ids.add(club.id())) {
                throw new IllegalArgumentException("The inventory lists club " + club.id() + " twice.");
            }
        }
        this.clubs = List.copyOf(sorted);
        this.ladder = ladder;
        this.gripMarkCounts = new int[clubs.size()];
        int max = 0;
        int states = 0;
        for (int c = 0; c < clubs.size(); c++) {
            gripMarkCounts[c] = (int) Math.floor(clubs.get(c).handleLengthM() / GRIP_STEP_M + 1e-9) + 1;
            max = Math.max(max, gripMarkCounts[c]);
            states += gripMarkCounts[c] * ladder.size();
        }
        this.maxGripMarks = max;
        this.stateCount = states;
    }

    public List<ClubOption> clubs() {
        return clubs;
    }

    public CycleTimeLadder ladder() {
        return ladder;
    }

    public ClubOption club(int club) {
        return clubs.get(club);
    }

    /** Number of grip marks on a club: 0, 2.5, 5, … cm up to its handle length. */
    public int gripMarkCount(int club) {
        return gripMarkCounts[club];
    }

    /** Distance of grip mark {@code gripMark} from the knob end, in metres. */
    public double gripMarkM(int gripMark) {
        return gripMark * GRIP_STEP_TENTH_MM / 10_000.0;
    }

    public double cycleTimeS(int cycleRung) {
        return ladder.rungS(cycleRung);
    }

    /** Number of states (club, grip mark, cycle time) in the space. */
    public int stateCount() {
        return stateCount;
    }

    public boolean contains(PlanState state) {
        return state.club() < clubs.size() && state.gripMark() < gripMarkCounts[state.club()]
                && state.cycleRung() < ladder.size();
    }

    /**
     * The state of a club (by id) at a grip mark and cycle time given in SI units. Values off the 2.5 cm grid, beyond
     * the club's handle or not on the ladder are refused with a message saying why, never rounded to a neighbour.
     */
    public PlanState stateAt(String clubId, double gripMarkM, double cycleTimeS) {
        int club = indexOfClub(clubId);
        double marks = gripMarkM / GRIP_STEP_M;
        long mark = Math.round(marks);
        if (!Double.isFinite(gripMarkM) || Math.abs(mark * GRIP_STEP_M - gripMarkM) > GRID_TOLERANCE_M || mark < 0) {
            throw new IllegalArgumentException("Grip mark " + gripMarkM + " m is not on the 2.5 cm grid.");
        }
        if (mark >= gripMarkCounts[club]) {
            throw new IllegalArgumentException("Grip mark " + gripMarkM + " m lies beyond the handle of club " + clubId
                    + " (" + clubs.get(club).handleLengthM() + " m).");
        }
        for (int rung = 0; rung < ladder.size(); rung++) {
            if (Math.abs(ladder.rungS(rung) - cycleTimeS) <= GRID_TOLERANCE_M) {
                return new PlanState(club, (int) mark, rung);
            }
        }
        throw new IllegalArgumentException("Cycle time " + cycleTimeS + " s is not on the ladder " + ladder.rungsS());
    }

    public int indexOfClub(String clubId) {
        for (int c = 0; c < clubs.size(); c++) {
            if (clubs.get(c).id().equals(clubId)) {
                return c;
            }
        }
        throw new IllegalArgumentException("Club " + clubId + " is not in the inventory.");
    }

    /** Every state, clubs in mass order, then grip mark from the knob, then cycle time from the slowest. */
    public List<PlanState> states() {
        List<PlanState> states = new ArrayList<>(stateCount);
        for (int c = 0; c < clubs.size(); c++) {
            for (int g = 0; g < gripMarkCounts[c]; g++) {
                for (int t = 0; t < ladder.size(); t++) {
                    states.add(new PlanState(c, g, t));
                }
            }
        }
        return states;
    }

    /**
     * The positions one dial step away in the index grid, whether or not they are states (a neighbouring club may
     * have no grip mark this far from the knob). Order: club down, club up, grip toward the knob, grip toward the
     * head, slower, faster.
     */
    public List<PlanState> adjacentPositions(PlanState state) {
        List<PlanState> positions = new ArrayList<>(6);
        if (state.club() > 0) {
            positions.add(new PlanState(state.club() - 1, state.gripMark(), state.cycleRung()));
        }
        if (state.club() + 1 < clubs.size()) {
            positions.add(new PlanState(state.club() + 1, state.gripMark(), state.cycleRung()));
        }
        if (state.gripMark() > 0) {
            positions.add(new PlanState(state.club(), state.gripMark() - 1, state.cycleRung()));
        }
        if (state.gripMark() + 1 < gripMarkCounts[state.club()]) {
            positions.add(new PlanState(state.club(), state.gripMark() + 1, state.cycleRung()));
        }
        if (state.cycleRung() > 0) {
            positions.add(new PlanState(state.club(), state.gripMark(), state.cycleRung() - 1));
        }
        if (state.cycleRung() + 1 < ladder.size()) {
            positions.add(new PlanState(state.club(), state.gripMark(), state.cycleRung() + 1));
        }
        return positions;
    }

    /** The one dial that differs between two adjacent positions. */
    static Dial changedDial(PlanState from, PlanState to) {
        if (from.club() != to.club()) {
            return Dial.CLUB;
        }
        return from.gripMark() != to.gripMark() ? Dial.GRIP_MARK : Dial.CYCLE_TIME;
    }

    // --- flat slot numbering for the search: slot = (club × maxGripMarks + gripMark) × rungs + cycleRung ---

    int slotCount() {
        return clubs.size() * maxGripMarks * ladder.size();
    }

    int slotOf(PlanState state) {
        return (state.club() * maxGripMarks + state.gripMark()) * ladder.size() + state.cycleRung();
    }

    PlanState stateOfSlot(int slot) {
        int rungs = ladder.size();
        int cycle = slot % rungs;
        int rest = slot / rungs;
        return new PlanState(rest / maxGripMarks, rest % maxGripMarks, cycle);
    }

    boolean isState(int slot) {
        int rest = slot / ladder.size();
        return rest % maxGripMarks < gripMarkCounts[rest / maxGripMarks];
    }

    /** Writes the slots of the states one dial step from {@code slot} into {@code out}; returns how many. */
    int neighbourSlots(int slot, int[] out) {
        int rungs = ladder.size();
        int cycle = slot % rungs;
        int rest = slot / rungs;
        int grip = rest % maxGripMarks;
        int club = rest / maxGripMarks;
        int clubStride = maxGripMarks * rungs;
        int n = 0;
        if (club > 0 && grip < gripMarkCounts[club - 1]) {
            out[n++] = slot - clubStride;
        }
        if (club + 1 < clubs.size() && grip < gripMarkCounts[club + 1]) {
            out[n++] = slot + clubStride;
        }
        if (grip > 0) {
            out[n++] = slot - rungs;
        }
        if (grip + 1 < gripMarkCounts[club]) {
            out[n++] = slot + rungs;
        }
        if (cycle > 0) {
            out[n++] = slot - 1;
        }
        if (cycle + 1 < rungs) {
            out[n++] = slot + 1;
        }
        return n;
    }
}
