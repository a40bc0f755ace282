package org.strandbook.samplesite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.PointInputs;
import org.strandbook.evaluation.Status;
import org.strandbook.site.DecisionRule;

/**
 * The demo's two loops that a fixed tolerance gets wrong, as the README tells them. Invented data:
 * this checks that the demo shows what it claims, not the physics (the rule itself is checked in
 * core against JCGM 106:2012's zones).
 */
class DecisionRuleDemoTest {

    private static final Map<String, PointInputs> INPUTS = new HashMap<>();

    @BeforeAll
    static void generateTheDemo() {
        DemoPlant plant = new DemoPlant();
        InMemoryScans scans = new InMemoryScans(new ScanGenerator(plant, ScanGenerator.DEMO_SEED).generate());
        for (PointInputs in : scans.inputs(plant)) {
            INPUTS.put(in.point().tag(), in);
        }
    }

    private static PointEvaluation evaluate(String tag, DecisionRule rule) {
        return PointEvaluator.withDefaults().evaluate(INPUTS.get(tag), rule);
    }

    @Test
    void theShortLoopsDirtyJointPassesTheFixedRuleAndFailsOnTheInterval() {
        assertEquals(Status.PASS, evaluate("AT-4109", DecisionRule.FIXED).status());
        PointEvaluation onInterval = evaluate("AT-4109", DecisionRule.interval());
        assertEquals(Status.FAIL, onInterval.status());
        assertTrue(onInterval.worstBand().orElseThrow().reason().contains("more than the guard band"),
                onInterval.worstBand().orElseThrow().reason());
        assertTrue(onInterval.shortFinding().startsWith("dirty or misaligned connector"), onInterval.shortFinding());
    }

    @Test
    void theLongLoopFailsTheFixedRuleAndPassesOnTheInterval() {
        assertEquals(Status.FAIL, evaluate("AT-4203", DecisionRule.FIXED).status());
        PointEvaluation onInterval = evaluate("AT-4203", DecisionRule.interval());
        assertEquals(Status.PASS, onInterval.status(), onInterval.worstBand().orElseThrow().reason());
        assertTrue(onInterval.shortFinding().startsWith("as predicted within its coverage interval"),
                onInterval.shortFinding());
    }

    @Test
    void aPassOnTheIntervalSendsNobodyIntoTheField() {
        // design choice: a deviation the recorded parts may have names its size, never a cable to walk
        String finding = evaluate("AT-4203", DecisionRule.interval()).finding();
        assertTrue(finding.endsWith("nothing to do in the field") && !finding.contains("walk"), finding);
    }
}
