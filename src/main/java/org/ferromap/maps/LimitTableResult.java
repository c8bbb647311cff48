package org.ferromap.maps;

import java.util.List;

/**
 * A cable-length limit table, ready for charts, CSV and JSON.
 *
 * @param study            the study's title
 * @param limitDefinition  what the limit columns mean
 * @param linearCriterion  the linear criterion beside them, with its source
 * @param rows             the rows: voltage class, connection, cable, open phases, rating (rating fastest)
 * @param sources          where every default came from
 * @param notes            what the figures assume
 */
public record LimitTableResult(String study, String limitDefinition, String linearCriterion, List<LimitRow> rows,
                               List<String> sources, List<String> notes) {

    public LimitTableResult {
        rows = List.copyOf(rows);
        sources = List.copyOf(sources);
        notes = List.copyOf(notes);
    }
}
