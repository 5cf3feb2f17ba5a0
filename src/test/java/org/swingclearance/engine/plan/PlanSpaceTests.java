package org.swingclearance.engine.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The plan's state grid: grip marks every 2.5 cm up to the handle, cycle-time ladders, clubs in mass order. */
class PlanSpaceTests {

    @Test
    void gripMarksRunEvery2Point5CmFromTheKnobUpToTheHandleLength() {
        PlanSpace space = new PlanSpace(List.of(new ClubOption("A", 4, 0.11), new ClubOption("B", 6, 0.475)),
                CycleTimeLadder.of(2.0));

        assertThat(space.gripMarkCount(0)).as("0, 2.5, 5, 7.5, 10 cm; 11 cm is off the grid").isEqualTo(5);
        assertThat(space.gripMarkCount(1)).as("0 … 47.5 cm").isEqualTo(20);
        assertThat(space.gripMarkM(3)).isEqualTo(0.075);
        assertThat(space.stateCount()).isEqualTo(25);
    }

    @Test
    void clubsAreOrderedByMassSoNeighbouringClubsDifferLeast() {
        PlanSpace space = new PlanSpace(List.of(new ClubOption("heavy", 10, 0), new ClubOption("light", 2, 0),
                new ClubOption("mid", 6, 0)), CycleTimeLadder.of(2.0));

        assertThat(space.clubs()).extracting(ClubOption::id).containsExactly("light", "mid", "heavy");
    }

    @Test
    void evenlySpacedLadderFrom3Point0To1Point2SecondsIn0Point1Rungs() {
        CycleTimeLadder ladder = CycleTimeLadder.evenlySpaced(3.0, 1.2, 0.1);

        assertThat(ladder.size()).isEqualTo(19);
        assertThat(ladder.rungS(0)).isEqualTo(3.0);
        assertThat(ladder.rungS(5)).isEqualTo(2.5);
        assertThat(ladder.rungS(18)).isEqualTo(1.2);
    }

    @Test
    void ladderIsHeldSlowestFirstAndRefusesDuplicates() {
        assertThat(CycleTimeLadder.of(1.5, 3.0, 2.0).rungsS()).containsExactly(3.0, 2.0, 1.5);
        assertThatThrownBy(() -> CycleTimeLadder.of(2.0, 2.0)).hasMessageContaining("twice");
        assertThatThrownBy(() -> CycleTimeLadder.of(0)).hasMessageContaining("positive");
    }

    @Test
    void stateAtRefusesValuesOffTheGridInsteadOfRounding() {
        PlanSpace space = new PlanSpace(List.of(new ClubOption("A", 4, 0.10)), CycleTimeLadder.of(3.0, 2.5));

        assertThat(space.stateAt("A", 0.075, 2.5)).isEqualTo(new PlanState(0, 3, 1));
        assertThatThrownBy(() -> space.stateAt("A", 0.08, 2.5)).hasMessageContaining("not on the 2.5 cm grid");
        assertThatThrownBy(() -> space.stateAt("A", 0.125, 2.5)).hasMessageContaining("beyond the handle");
        assertThatThrownBy(() -> space.stateAt("A", 0.05, 2.0)).hasMessageContaining("not on the ladder");
        assertThatThrownBy(() -> space.stateAt("Z", 0.05, 2.5)).hasMessageContaining("not in the inventory");
    }

    @Test
    void adjacentPositionsIncludeAGripMarkTheNeighbouringClubLacks() {
        PlanSpace space = new PlanSpace(List.of(new ClubOption("short", 4, 0.025), new ClubOption("long", 5, 0.10)),
                CycleTimeLadder.of(2.0));
        PlanState longAt5Cm = space.stateAt("long", 0.05, 2.0);

        List<PlanState> positions = space.adjacentPositions(longAt5Cm);

        assertThat(positions).contains(new PlanState(0, 2, 0));
        assertThat(space.contains(new PlanState(0, 2, 0))).isFalse();
    }

    @Test
    void evaluationRefusesAPermittedStateBeyondTheBand() {
        assertThatThrownBy(() -> Evaluation.withinBand(1.2, "C1")).hasMessageContaining("D ≤ 1");
        assertThatThrownBy(() -> Evaluation.withinBand(Double.NaN, "C1")).isInstanceOf(IllegalArgumentException.class);
        assertThat(Evaluation.outsideEnvelope(Double.POSITIVE_INFINITY, "C1").permittedAtNextBand()).isFalse();
    }
}
