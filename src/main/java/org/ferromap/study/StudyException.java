package org.ferromap.study;

import java.util.List;
import java.util.stream.Collectors;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * A study file that cannot be used, with every problem found in it (the whole file is validated
 * before failing). The exception's own key is that of the first problem; each problem carries its
 * own.
 */
public class StudyException extends FerromapException {

    private static final long serialVersionUID = 1L;

    private final transient List<Problem> problems;

    public StudyException(List<Problem> problems) {
        super(problems.isEmpty() ? MessageKey.UNREADABLE_FILE : problems.get(0).key(), format(problems));
        this.problems = List.copyOf(problems);
    }

    /** Every problem, in file order as far as the reader walks it. */
    public List<Problem> problems() {
        return problems;
    }

    private static String format(List<Problem> problems) {
        if (problems.isEmpty()) {
            return "the study cannot be used";
        }
        String head = problems.size() == 1 ? "1 problem in the study:" : problems.size() + " problems in the study:";
        return head + "\n" + problems.stream().map(p -> "  " + p.describe()).collect(Collectors.joining("\n"));
    }
}
