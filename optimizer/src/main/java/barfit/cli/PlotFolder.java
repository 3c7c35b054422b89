package barfit.cli;

import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The files a command draws into a folder the user named, one per line: checked before any work, so that
 * nothing the user has is replaced without {@code --force} and no run is wasted on a folder that is a file.
 */
final class PlotFolder {
    private PlotFolder() {}

    /** {@code dir/<id><suffix>} per id, the id made safe as a file name. */
    static List<Path> targets(Path dir, List<String> ids, String suffix, boolean force) {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new InputError(Location.ofFile(dir.toString()), "is a file; expected a folder for the plots");
        }
        List<Path> out = new ArrayList<>();
        for (String id : ids) {
            Path p = dir.resolve(id.replaceAll("[^A-Za-z0-9._-]", "_") + suffix);
            if (Files.exists(p) && !force) {
                throw new InputError(
                        Location.ofFile(p.toString()),
                        "exists; expected a new folder, or --force to replace the plots");
            }
            out.add(p);
        }
        return out;
    }
}
