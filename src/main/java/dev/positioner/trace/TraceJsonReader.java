package dev.positioner.trace;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.io.InputStream;

/**
 * Streams a JSON trace, either an array of samples or {"samples": [...]}, each sample
 * {"t": s, "input": v, "position": v, "controllerOutput": v, "processValue": v}. Samples are
 * handed on one at a time, so memory does not grow with the length of the trace.
 */
public final class TraceJsonReader {

    private static final JsonFactory JSON = new JsonFactory();

    private final long maxSamples;
    private final SignalUnit signalUnit;
    private final SignalUnit positionUnit;

    public TraceJsonReader(long maxSamples, SignalUnit signalUnit, SignalUnit positionUnit) {
        this.maxSamples = maxSamples;
        this.signalUnit = signalUnit;
        this.positionUnit = positionUnit;
    }

    public TraceSummary read(InputStream in, SampleConsumer sink) throws IOException {
        SampleGate gate = new SampleGate(maxSamples, sink, "t");
        long row = 0;
        try (JsonParser p = JSON.createParser(in)) {
            JsonToken first = p.nextToken();
            if (first == JsonToken.START_OBJECT) {
                while (p.nextToken() == JsonToken.FIELD_NAME && !"samples".equals(p.currentName())) {
                    p.nextToken();
                    p.skipChildren();
                }
                if (p.nextToken() != JsonToken.START_ARRAY) {
                    throw new TraceFormatException(0, "samples", "expected an array of samples");
                }
            } else if (first != JsonToken.START_ARRAY) {
                throw new TraceFormatException(0, null, "expected a JSON array of samples or {\"samples\": [...]}");
            }
            while (p.nextToken() == JsonToken.START_OBJECT) {
                row++;
                gate.offer(row, sample(p, row));
            }
        }
        return gate.finish(row);
    }

    private Sample sample(JsonParser p, long row) throws IOException {
        double t = Double.NaN, input = Double.NaN, position = Double.NaN, output = Double.NaN, pv = Double.NaN;
        while (p.nextToken() == JsonToken.FIELD_NAME) {
            String field = p.currentName();
            JsonToken value = p.nextToken();
            if (!value.isNumeric()) {
                if (value == JsonToken.START_OBJECT || value == JsonToken.START_ARRAY) {
                    p.skipChildren();
                }
                throw new TraceFormatException(row, field, "expected a number");
            }
            double v = p.getDoubleValue();
            switch (field) {
                case "t", "time" -> t = v;
                case "input" -> input = signalUnit.toPercent(v);
                case "position" -> position = positionUnit.toPercent(v);
                case "controllerOutput" -> output = signalUnit.toPercent(v);
                case "processValue" -> pv = v;
                default -> { }
            }
        }
        if (Double.isNaN(t) || Double.isNaN(input) || Double.isNaN(position)) {
            throw new TraceFormatException(row, Double.isNaN(t) ? "t" : Double.isNaN(input) ? "input" : "position",
                    "each sample needs t, input and position");
        }
        return new Sample(t, input, position, output, pv);
    }
}
