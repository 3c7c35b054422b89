package barfit.schedule;

import barfit.design.span.SpanDesigner;
import java.util.List;

/**
 * Why the beams of a group are left out of the rationalisation: they share no section size in which each
 * passes. Each member with its own optimum's size and the limits it was given (null where none).
 */
public record GroupClash(String group, List<Member> members) implements SpanDesigner.Diagnosis.Cause {
    public GroupClash {
        members = List.copyOf(members);
    }

    /** A beam of the group: its mark, its own optimum's b x h, its max_depth and fixed width. */
    public record Member(String id, double width, double height, Double maxDepth, Double fixedWidth) {}
}
