package dev.penduline.services;

import java.util.Optional;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.swing.SwingAnalyzer;
import dev.penduline.records.swing.SwingRecord;

/**
 * Analyses one swing record: release, zero offset, turning points, cycles, decay envelopes,
 * the decrement regression, a first look at the dominant loss (the fit decides), the stop and,
 * when the mechanism is known, first friction estimates and the band of static friction the stop
 * allows. The use case behind {@code penduline analyze} and the Swing Chart.
 */
public final class SwingSessionAnalysis {

    private SwingSessionAnalysis() {
    }

    /**
     * Analyses a record.
     *
     * @param record    the record (SI)
     * @param mechanism the mechanism, when known (for the period check and SI estimates)
     * @return the analysis
     * @throws InputException when the record cannot be analysed (too short, never released ...)
     */
    public static SwingAnalysis analyse(SwingRecord record, Optional<MechanismSource> mechanism)
            throws InputException {
        SwingAnalyzer analyzer = new SwingAnalyzer();
        if (mechanism.isPresent()) {
            // The record's own offset stands for the equilibrium angle of the sensor's frame.
            MechanismProperties p = mechanism.get().properties();
            analyzer = analyzer.withMechanism(new MechanismProperties(p.mass(), p.centroidDistance(),
                    p.pivotInertia(), 0, p.gravity(), p.axisTilt()));
        }
        try {
            return analyzer.analyse(record.times(), record.angles());
        } catch (InvalidValueException e) {
            throw new InputException(record.source() + ": cannot be analysed: " + e.getMessage(), e);
        }
    }
}
