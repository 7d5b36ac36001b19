package dev.positioner.trace;

/**
 * Receives a trace one sample at a time, in time order. The CSV reader and the JSON form of a
 * trace both feed the same consumers, so every analyser works on a stream and never needs the
 * whole trace in memory.
 */
@FunctionalInterface
public interface SampleConsumer {

    void accept(Sample sample);

    /** Feeds each sample to this consumer and then to {@code next}. */
    default SampleConsumer andThen(SampleConsumer next) {
        return s -> {
            accept(s);
            next.accept(s);
        };
    }
}
