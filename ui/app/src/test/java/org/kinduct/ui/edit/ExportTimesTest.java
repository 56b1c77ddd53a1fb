package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.render.export.ExportInstant;
import org.kinduct.scene.Scene;

/** The export's instants offered as the command line's --at takes them, and typed the same way. */
class ExportTimesTest {

    @Test
    void theChoicesAreThePeakEachConductorsPeakAndTheExactTimeShown() {
        Scene s = Fixtures.loopAndMagnet();
        double shown = 0.123456789;
        List<ExportTimes.Choice> choices = ExportTimes.of(s, shown);
        assertEquals(List.of(ExportInstant.peak(), new ExportInstant.Peak("loop"), new ExportInstant.At(shown)),
                choices.stream().map(ExportTimes.Choice::instant).toList());
        assertEquals("peak of loop", choices.get(1).label());
        assertTrue(choices.get(2).label().startsWith("the time shown, 123 ms"), choices.get(2).label());
        assertEquals(new ExportInstant.At(shown), ExportTimes.parse(choices.get(2).label(), choices),
                "the time shown exactly, not as its label rounds it");
    }

    @Test
    void typedTextIsReadAsTheCommandLineReadsIt() {
        List<ExportTimes.Choice> choices = ExportTimes.of(Fixtures.loopAndMagnet(), 0);
        assertEquals(ExportInstant.peak(), ExportTimes.parse(" peak ", choices));
        assertEquals(new ExportInstant.Peak("loop"), ExportTimes.parse("peak:loop", choices));
        assertEquals(new ExportInstant.At(0.05), ExportTimes.parse("50 ms", choices));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ExportTimes.parse("soon", choices));
        assertTrue(e.getMessage().contains("time"), e.getMessage());
    }
}
