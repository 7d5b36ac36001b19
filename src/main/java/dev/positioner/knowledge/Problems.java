package dev.positioner.knowledge;

import java.util.ArrayList;
import java.util.List;

/** Collects problems for one file; the loader merges them into one list for the whole base. */
final class Problems {

    private final String file;
    private final List<KnowledgeProblem> sink;

    Problems(String file, List<KnowledgeProblem> sink) {
        this.file = file;
        this.sink = sink;
    }

    void add(int line, String entry, String message) {
        sink.add(new KnowledgeProblem(file, line, entry, message));
    }

    String file() {
        return file;
    }
}
