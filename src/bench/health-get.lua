-- wrk script: the health endpoint, measured in the same run as a floor for the HTTP stack itself.
done = function(summary, latency, requests)
  io.write(string.format("RESULT requests=%d errors=%d rps=%.1f p50_ms=%.2f p99_ms=%.2f\n",
    summary.requests, summary.errors.status + summary.errors.connect + summary.errors.read + summary.errors.write + summary.errors.timeout,
    summary.requests / (summary.duration / 1e6), latency:percentile(50) / 1000, latency:percentile(99) / 1000))
end
