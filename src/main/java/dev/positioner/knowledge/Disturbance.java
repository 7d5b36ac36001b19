package dev.positioner.knowledge;

import java.util.List;

/**
 * What a check or a repair disturbs, from nothing to the process itself. Each class names the
 * cautions every step of its kind must carry and the minute-equivalents the planner adds for the
 * exposure, so a step that moves a live valve or starves a shared hydraulic unit is never priced
 * like a gauge reading. {@code bypass} says whether the class means the positioner is bypassed or
 * the valve out of service, which is what the base vocabulary's bypass flag promises clients.
 */
public record Disturbance(String code, String title, double penaltyMinutes, boolean bypass, List<String> cautions,
        List<String> sources) {
}
