package org.halyard.survey;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * The line data to process and which of its lines are tie lines.
 *
 * @param lines    the imported lines
 * @param tieLines identifiers of the tie lines (the recipe's {@code survey.tie_lines}); may be empty
 */
public record SurveyInput(SurveyLines lines, Set<String> tieLines) {

    public SurveyInput {
        tieLines = Set.copyOf(tieLines);
        List<String> unknown = new ArrayList<>();
        for (String t : tieLines) {
            if (lines.lineIndex(t) < 0) {
                unknown.add(t);
            }
        }
        if (!unknown.isEmpty()) {
            List<String> some = new ArrayList<>();
            for (int l = 0; l < Math.min(12, lines.lineCount()); l++) {
                some.add(lines.lineId(l));
            }
            throw new IllegalArgumentException(lines.source() + ": tie line" + (unknown.size() > 1 ? "s " : " ")
                    + String.join(", ", unknown) + " not in the survey; lines present: " + String.join(", ", some)
                    + (lines.lineCount() > 12 ? ", ... (" + lines.lineCount() + " lines)" : ""));
        }
    }

    /** Per line, whether it is a tie line. */
    public boolean[] tieMask() {
        boolean[] m = new boolean[lines.lineCount()];
        for (int l = 0; l < m.length; l++) {
            m[l] = tieLines.contains(lines.lineId(l));
        }
        return m;
    }
}
