package barfit.report;

import barfit.report.html.ScheduleHtml;
import barfit.report.html.StandardisationPlot;
import barfit.schedule.ScheduleResult;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.CompletableFuture;

/** The files a schedule writes, by name, in the order they are listed. */
public final class ScheduleFiles {
    private ScheduleFiles() {}

    public static Map<String, String> render(ScheduleResult r) {
        Map<String, String> files = new LinkedHashMap<>();
        // the report, the largest, is drawn while the others are rendered (it uses every core itself)
        CompletableFuture<String> report = CompletableFuture.supplyAsync(() -> ScheduleHtml.render(r));
        files.put("schedule.csv", ScheduleCsv.render(r));
        files.put("bending-schedule.csv", BendingScheduleCsv.render(r));
        files.put("schedule.json", ScheduleJson.render(r));
        files.put("report.html", report.join());
        if (!r.standardisation().isEmpty()) { // the curve is computed only when the schedule is rationalised
            files.put("standardisation.svg", StandardisationPlot.svg(r));
        }
        return files;
    }
}
