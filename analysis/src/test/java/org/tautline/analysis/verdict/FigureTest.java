package org.tautline.analysis.verdict;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class FigureTest {
    @Test
    void knowsEveryFigureAndTheDampingRatioOfEachHarmonic() {
        assertEquals(Figure.TENSION, Figure.require("tensionN"));
        assertEquals("damping ratio of harmonic 12", Figure.require("dampingRatio12").label());
        assertEquals(Optional.empty(), Figure.byKey("dampingRatio0"));
        assertEquals(Optional.empty(), Figure.byKey("dampingRatio61"));
        assertEquals(Optional.empty(), Figure.byKey("dampingRatio01"));
        assertEquals(Optional.empty(), Figure.byKey("TensionN"), "letter case counts");
    }

    @Test
    void namesTheFigureThatWasProbablyMeant() {
        AnalysisException e = assertThrows(AnalysisException.class, () -> Figure.require("tensionn"));
        assertEquals("figure 'tensionn' does not exist (did you mean 'tensionN'?); expected one of f1Hz, tensionN,"
                + " bendingStiffnessNm2, inharmonicityB, forcingPositionM, sensorPositionM, fitNormalisedResidual,"
                + " resonanceFrfRelativeStdError, linearityShift1, dampingRatio1 .. dampingRatio60", e.getMessage());
        assertTrue(Figure.byKey("dampingRation1").isEmpty());
        assertTrue(assertThrows(AnalysisException.class, () -> Figure.require("dampngRatio1")).getMessage()
                .contains("did you mean 'dampingRatio1'?"));
        assertTrue(!assertThrows(AnalysisException.class, () -> Figure.require("weight")).getMessage()
                .contains("did you mean"), "nothing close: no guess");
    }

    @Test
    void takesATypographicUnitAsTheFiguresOwn() {
        assertEquals(Optional.of("N m^2"), Figure.BENDING_STIFFNESS.unitFor("N m²"));
        assertEquals(Optional.of("N m^2"), Figure.BENDING_STIFFNESS.unitFor("N·m²"));
        assertEquals(Optional.of("N m^2"), Figure.BENDING_STIFFNESS.unitFor(" N  m^2 "));
        assertEquals(Optional.empty(), Figure.BENDING_STIFFNESS.unitFor("N mm^2"));
        assertEquals(Optional.of(""), Figure.INHARMONICITY.unitFor("1"));
        assertEquals(Optional.empty(), Figure.TENSION.unitFor("kN"));
        assertEquals("N m²", Figure.BENDING_STIFFNESS.unitLabel());
        assertEquals("no unit", Figure.INHARMONICITY.unitLabel());
    }
}
