-- wrk script: POST the one-shot example of the contract (the DESIGN.md request) to the diagnosis endpoint.
wrk.method = "POST"
wrk.headers["Content-Type"] = "application/json"
wrk.body = [[{"symptoms": ["slow_stroke"],
 "measurements": [{"quantity": "supply_pressure", "value": 205, "unit": "psi"}],
 "checks": [{"check": "read_filter_dp", "outcome": "normal"}],
 "unavailableChecks": ["pump_flow_test"],
 "asset": {"tag": "PV-2041", "oilGrade": "VG46", "cleanlinessTarget": "16/14/11",
           "design": [{"quantity": "piston_bore", "value": 8, "unit": "in"}]}}]]

done = function(summary, latency, requests)
  io.write(string.format("RESULT requests=%d errors=%d rps=%.1f p50_ms=%.2f p99_ms=%.2f\n",
    summary.requests, summary.errors.status + summary.errors.connect + summary.errors.read + summary.errors.write + summary.errors.timeout,
    summary.requests / (summary.duration / 1e6), latency:percentile(50) / 1000, latency:percentile(99) / 1000))
end
