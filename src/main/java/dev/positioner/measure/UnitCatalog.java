package dev.positioner.measure;

import static javax.measure.MetricPrefix.KILO;
import static javax.measure.MetricPrefix.MEGA;
import static javax.measure.MetricPrefix.MILLI;

import java.util.Map;
import java.util.Optional;
import javax.measure.Unit;
import systems.uom.common.Imperial;
import systems.uom.common.USCustomary;
import tech.units.indriya.unit.Units;

/**
 * Unit codes accepted on the wire, mapped to JSR 385 units. psi is built as pound-force per square
 * inch (the pound-force of systems-common, 4.448 N by definition) rather than typed in as 6894.757 Pa; bar is the defined
 * 10^5 Pa. The canonical unit of each kind is listed too so conversions have a target.
 */
final class UnitCatalog {

    private static final Unit<?> PSI = Imperial.POUND_FORCE.divide(USCustomary.INCH.pow(2));

    static final Map<String, Unit<?>> UNITS = Map.ofEntries(
            Map.entry("Pa", Units.PASCAL),
            Map.entry("kPa", KILO(Units.PASCAL)),
            Map.entry("MPa", MEGA(Units.PASCAL)),
            Map.entry("bar", Units.PASCAL.multiply(100_000)),
            Map.entry("psi", PSI),
            Map.entry("degC", Units.CELSIUS),
            Map.entry("degF", USCustomary.FAHRENHEIT),
            Map.entry("K", Units.KELVIN),
            Map.entry("s", Units.SECOND),
            Map.entry("min", Units.MINUTE),
            Map.entry("h", Units.HOUR),
            Map.entry("m", Units.METRE),
            Map.entry("mm", MILLI(Units.METRE)),
            Map.entry("in", USCustomary.INCH),
            Map.entry("ft", USCustomary.FOOT),
            Map.entry("kg", Units.KILOGRAM),
            Map.entry("lb", USCustomary.POUND),
            Map.entry("N", Units.NEWTON),
            Map.entry("kN", KILO(Units.NEWTON)),
            Map.entry("lbf", Imperial.POUND_FORCE),
            Map.entry("m3_per_s", Units.CUBIC_METRE.divide(Units.SECOND)),
            Map.entry("L_per_min", Units.LITRE.divide(Units.MINUTE)),
            Map.entry("gpm", USCustomary.GALLON_LIQUID.divide(Units.MINUTE)),
            Map.entry("m3_per_h", Units.CUBIC_METRE.divide(Units.HOUR)),
            Map.entry("m_per_s", Units.METRE.divide(Units.SECOND)),
            Map.entry("mm_per_min", MILLI(Units.METRE).divide(Units.MINUTE)),
            Map.entry("in_per_min", USCustomary.INCH.divide(Units.MINUTE)),
            // Kinematic viscosity: the centistoke is defined as 1 mm2/s.
            Map.entry("mm2_per_s", MILLI(Units.METRE).pow(2).divide(Units.SECOND)),
            Map.entry("cSt", MILLI(Units.METRE).pow(2).divide(Units.SECOND)));

    private UnitCatalog() {
    }

    static Optional<Unit<?>> unit(String code) {
        return Optional.ofNullable(UNITS.get(code));
    }
}
