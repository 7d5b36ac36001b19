package dev.positioner.knowledge;

/** One thing wrong with the knowledge base, located as precisely as the source allows. */
public record KnowledgeProblem(String file, int line, String entry, String message) {

    @Override
    public String toString() {
        String where = line > 0 ? file + ":" + line : file;
        return entry == null || entry.isBlank() ? where + ": " + message : where + " [" + entry + "]: " + message;
    }
}
