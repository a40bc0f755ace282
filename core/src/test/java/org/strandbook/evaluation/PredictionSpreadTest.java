package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.optics.joint.ConnectorAllowance;
import org.strandbook.optics.path.FiberSegment;
import org.strandbook.optics.path.FiberSpec;
import org.strandbook.optics.path.JointElement;
import org.strandbook.optics.path.LightPath;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.optics.path.ProbeElement;
import org.strandbook.uncertainty.JointSource;
import org.strandbook.uncertainty.PathAllowances;
import org.strandbook.uncertainty.LossUncertainty;
import org.strandbook.uncertainty.PathUncertainty;

class PredictionSpreadTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(1000, 2500, 751);
    private static final PathUncertainty ENGINE = PathUncertainty.standard();
    /** A 60 m loop of low-OH (1 ppm) 400 µm fiber with a tight bend: OH bands, an IR edge and a skewed bend term. */
    private static final PredictedBudget LOOP = loop();
    private static final PredictionSpread SPREAD = PredictionSpread.of(LOOP, ENGINE);

    private static PredictedBudget loop() {
        FiberSpec fiber = FiberSpec.silicaCore(400, 440, 0.22,
                SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 1));
        LightPath path = LightPath.of("loop",
                FiberSegment.bent("send", fiber, 30, 40, 1),
                new JointElement("J1", fiber, fiber, ConnectorAllowance.SMA_905_TYPICAL),
                new ProbeElement("probe", List.of(), 1.0, Optional.empty()),
                new JointElement("J2", fiber, fiber, ConnectorAllowance.SMA_905_TYPICAL),
                FiberSegment.straight("return", fiber, 30));
        return new PredictedBudget("AT-4101", LossBudget.of(path, GRID), List.of(),
                PathAllowances.shipped(path, List.of(JointSource.ASSUMED_AIR_GAP, JointSource.ASSUMED_AIR_GAP)));
    }

    @Test
    void atAStationTheBandIsTheMonteCarloIntervalItself() {
        // JCGM 101:2008, 7.7.1: the probabilistically symmetric interval of the engine, unchanged but for
        // the stations' smaller trial count.
        int first = GRID.nearestIndex(1000 + 1500.0 / (PredictionSpread.EVEN_STATIONS - 1));
        LossUncertainty direct = ENGINE.withTrials(PredictionSpread.STATION_TRIALS).at(LOOP.budget(), first,
                LOOP.allowances());
        assertEquals(direct.budget().interval().low(), SPREAD.lowDb()[first], 1e-12);
        assertEquals(direct.budget().interval().high(), SPREAD.highDb()[first], 1e-12);
    }

    @Test
    void betweenStationsTheBandFollowsAFullMonteCarloRunThere() {
        // JCGM 101:2008, 7.7.1, run in full at wavelengths between stations, two of them on OH bands
        // (1383 nm first overtone, 2210 nm combination band; Humbach et al., J. Non-Cryst. Solids 203
        // (1996) 19) where the width changes fastest, with the engine's full 2·10⁵ trials. Design choice:
        // the interpolated ends within 5 % of the interval's width.
        for (double nm : new double[] {1240, 1383, 1420, 1700, 2150, 2210, 2300}) {
            int i = GRID.nearestIndex(nm);
            LossUncertainty direct = ENGINE.at(LOOP.budget(), i, LOOP.allowances());
            double width = direct.budget().interval().width();
            assertEquals(direct.budget().interval().low(), SPREAD.lowDb()[i], 0.05 * width, nm + " nm low");
            assertEquals(direct.budget().interval().high(), SPREAD.highDb()[i], 0.05 * width, nm + " nm high");
        }
    }

    @Test
    void bandHoldsThePredictionEverywhere() {
        // JCGM 101:2008, 7.7: a 95 % interval of a loss whose inputs spread both ways holds the estimate.
        double[] y = SPREAD.predictedLossDb();
        for (int i = 0; i < y.length; i++) {
            assertTrue(SPREAD.lowDb()[i] < y[i] && y[i] < SPREAD.highDb()[i], GRID.wavelengthNm(i) + " nm");
        }
        assertEquals(0.95, SPREAD.coverageProbability());
    }

    @Test
    void stationsCrowdWhereTheDominantInputChanges() {
        // Design choice: evenly spaced stations where the shares stay put; where the connectors hand
        // over to another input (an OH band's flank) stations are added at the change.
        double[][] steady = new double[751][];
        double[][] handover = new double[751][];
        for (int i = 0; i < 751; i++) {
            steady[i] = new double[] {0.7, 0.3};
            handover[i] = i < 400 ? new double[] {0.9, 0.1} : new double[] {0.1, 0.9};
        }
        assertEquals(PredictionSpread.EVEN_STATIONS, PredictionSpread.stations(steady).length);
        int[] crowded = PredictionSpread.stations(handover);
        assertTrue(crowded.length > PredictionSpread.EVEN_STATIONS);
        assertTrue(Arrays.stream(crowded).anyMatch(i -> i == 399 || i == 400),
                Arrays.toString(crowded));
    }
}
