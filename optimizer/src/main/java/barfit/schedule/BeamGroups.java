package barfit.schedule;

import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanProblem;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The beams the rationalisation places, in groups that take one section size each: with
 * {@code groups: same_section} the beams of a named group together, every other beam a group of its
 * own. Beams with no design on their own are left out. A group whose beams share no size in which each
 * passes (say one is capped below what another needs) cannot be rationalised: it is dropped, and its
 * beams are reported with the reason.
 */
final class BeamGroups {
    private final List<List<Integer>> members = new ArrayList<>();
    private final List<String> names = new ArrayList<>();
    private int[] groupOf;
    /** Beams of a group that share no size in which each passes: each with why, for the report. */
    private final Map<Integer, SpanDesigner.Diagnosis> failures = new TreeMap<>();

    /** Groups the beams, pricing exactly each size a group of two or more might share to see that one fits. */
    BeamGroups(ScheduleInput in, List<SpanDesigner.Outcome> own, SizePrices prices) {
        Map<String, List<Integer>> named = new LinkedHashMap<>();
        for (int i = 0; i < in.beams().size(); i++) {
            if (!own.get(i).feasible()) {
                continue;
            }
            String group = in.beams().get(i).group();
            if ((in.rationalise().groupsSameSection() || in.beams().get(i).sameSection()) && group != null) {
                named.computeIfAbsent(group, x -> new ArrayList<>()).add(i);
            } else {
                named.put("\u0000" + i, new ArrayList<>(List.of(i)));
            }
        }
        named.forEach((name, beams) -> {
            members.add(beams);
            names.add(name.startsWith("\u0000") ? null : name);
        });
        dropGroupsWithoutCommonSize(in, own, prices);
        groupOf = new int[in.beams().size()];
        Arrays.fill(groupOf, -1);
        for (int g = 0; g < members.size(); g++) {
            for (int i : members.get(g)) {
                groupOf[i] = g;
            }
        }
    }

    private void dropGroupsWithoutCommonSize(ScheduleInput in, List<SpanDesigner.Outcome> own, SizePrices prices) {
        boolean[] allBars = new boolean[in.space().barSizes().size()];
        Arrays.fill(allBars, true);
        List<Integer> clashing = new ArrayList<>();
        for (int g = 0; g < members.size(); g++) {
            List<Integer> beams = members.get(g);
            if (beams.size() < 2) {
                continue;
            }
            List<SizePrices.BeamSize> candidates = new ArrayList<>();
            for (int s = 0; s < prices.sizeCount(); s++) {
                if (eachFits(beams, s, prices, allBars)) {
                    for (int i : beams) {
                        candidates.add(new SizePrices.BeamSize(i, s));
                    }
                }
            }
            prices.priceExactly(candidates);
            boolean fits = false;
            for (int s = 0; s < prices.sizeCount() && !fits; s++) {
                fits = eachFits(beams, s, prices, allBars);
            }
            if (!fits) {
                clashing.add(g);
            }
        }
        for (int k = clashing.size() - 1; k >= 0; k--) {
            int g = clashing.get(k);
            SpanDesigner.Diagnosis why = clash(in, own, names.get(g), members.get(g));
            for (int i : members.get(g)) {
                failures.put(i, why);
            }
            members.remove(g);
            names.remove(g);
        }
    }

    private static boolean eachFits(List<Integer> beams, int size, SizePrices prices, boolean[] bars) {
        return beams.stream().allMatch(i -> Double.isFinite(prices.price(i, size, bars)));
    }

    private static SpanDesigner.Diagnosis clash(
            ScheduleInput in, List<SpanDesigner.Outcome> own, String name, List<Integer> beams) {
        List<GroupClash.Member> members = new ArrayList<>();
        for (int i : beams) {
            SpanProblem p = in.beams().get(i).problem();
            var layout = own.get(i).best().layout();
            members.add(new GroupClash.Member(p.id(), layout.width(), layout.height(), p.maxDepth(), p.fixedWidth()));
        }
        return new SpanDesigner.Diagnosis("group", new GroupClash(name, members));
    }

    int count() {
        return members.size();
    }

    boolean isEmpty() {
        return members.isEmpty();
    }

    /** The beams of group {@code g}, by their index in the schedule. */
    List<Integer> members(int g) {
        return members.get(g);
    }

    /** The group of beam {@code beam}, or -1 where it is left out. */
    int groupOf(int beam) {
        return groupOf[beam];
    }

    /** Why beam {@code beam}'s group could not be rationalised, or null where it could. */
    SpanDesigner.Diagnosis failure(int beam) {
        return failures.get(beam);
    }
}
