package dev.positioner.knowledge;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;

/**
 * A thin view over a SnakeYAML node that keeps its line number, so that every problem found in a
 * catalogue can point at the line a reliability engineer has to fix. Accessors never throw: a
 * wrong shape is reported to the {@link Problems} collector and a neutral value returned, so one
 * load reports every problem at once instead of the first.
 */
final class YamlNode {

    private final Node node;
    private final Problems problems;
    private final String entry;

    YamlNode(Node node, Problems problems, String entry) {
        this.node = node;
        this.problems = problems;
        this.entry = entry;
    }

    int line() {
        return node == null ? 0 : node.getStartMark().getLine() + 1;
    }

    boolean isMissing() {
        return node == null;
    }

    /** Children of a mapping in file order; reports a problem if this is not a mapping. */
    Map<String, YamlNode> map() {
        Map<String, YamlNode> out = new LinkedHashMap<>();
        if (node == null) {
            return out;
        }
        if (!(node instanceof MappingNode mapping)) {
            problems.add(line(), entry, "expected a mapping");
            return out;
        }
        for (NodeTuple tuple : mapping.getValue()) {
            String key = ((ScalarNode) tuple.getKeyNode()).getValue();
            String childEntry = entry == null ? key : entry;
            out.put(key, new YamlNode(tuple.getValueNode(), problems, childEntry));
        }
        return out;
    }

    YamlNode get(String key) {
        YamlNode child = map().get(key);
        return child != null ? child : new YamlNode(null, problems, entry);
    }

    YamlNode require(String key) {
        YamlNode child = get(key);
        if (child.isMissing()) {
            problems.add(line(), entry, "missing field '" + key + "'");
        }
        return child;
    }

    YamlNode withEntry(String name) {
        return new YamlNode(node, problems, name);
    }

    String text() {
        if (node instanceof ScalarNode scalar) {
            return scalar.getValue();
        }
        if (node != null) {
            problems.add(line(), entry, "expected a text value");
        }
        return "";
    }

    double number() {
        String text = text();
        if (node == null) {
            return Double.NaN;
        }
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            problems.add(line(), entry, "'" + text + "' is not a number");
            return Double.NaN;
        }
    }

    boolean bool() {
        String text = text();
        if (!text.equals("true") && !text.equals("false")) {
            if (node != null) {
                problems.add(line(), entry, "expected true or false, found '" + text + "'");
            }
            return false;
        }
        return Boolean.parseBoolean(text);
    }

    List<YamlNode> list() {
        List<YamlNode> out = new ArrayList<>();
        if (node == null) {
            return out;
        }
        if (!(node instanceof SequenceNode sequence)) {
            problems.add(line(), entry, "expected a list");
            return out;
        }
        for (Node item : sequence.getValue()) {
            out.add(new YamlNode(item, problems, entry));
        }
        return out;
    }

    /** A list of texts, or a single text written without brackets. */
    List<String> oneOrMoreTexts() {
        return node instanceof ScalarNode ? List.of(text()) : texts();
    }

    List<String> texts() {
        return list().stream().map(YamlNode::text).toList();
    }
}
