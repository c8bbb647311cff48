package org.ferromap.study;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.ferromap.errors.MessageKey;

/** Collects the problems of one file while it is walked; thrown together at the end. */
final class Problems {

    private final String file;
    private final List<Problem> list = new ArrayList<>();

    Problems(String file) {
        this.file = file;
    }

    void add(String path, String value, String allowed, MessageKey key) {
        list.add(new Problem(file, path, value == null ? "" : value, allowed, key));
    }

    boolean isEmpty() {
        return list.isEmpty();
    }

    int size() {
        return list.size();
    }

    /** Throws a {@link StudyException} with everything collected, if anything was. */
    void throwIfAny() {
        if (!list.isEmpty()) {
            throw new StudyException(list);
        }
    }

    /** A "did you mean" hint for a misspelt key, or empty. Edit distance at most 2 (1 for short words). */
    static String suggestion(String wrong, Collection<String> allowed) {
        String best = null;
        int bestD = Integer.MAX_VALUE;
        String w = wrong.toLowerCase(java.util.Locale.ROOT).replace('_', '-').replace(' ', '-');
        for (String a : allowed) {
            int d = distance(w, a);
            if (d < bestD) {
                bestD = d;
                best = a;
            }
        }
        int limit = wrong.length() <= 4 ? 1 : 2;
        return best != null && bestD <= limit ? "did you mean '" + best + "'? " : "";
    }

    /** Levenshtein distance. */
    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
