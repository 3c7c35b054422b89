package barfit.serve;

import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * What the page asks of a design file: its beams and lines with their controls, and answers for a request.
 * Each method may throw {@link ControlError} for a value the file reader refuses.
 */
public interface Explorer {
    /** The file's name as the user gave it, for the page's title. */
    String fileName();

    /** The caution the page carries: who must check the results, and what the tool does not cover. */
    String caution();

    /** The beams and lines, the controls' values as the file gives them, the choices (bar sizes) and units. */
    ObjectNode items();

    /** Exactly what {@code design --format json} prints for the beam or line so changed. */
    String design(Controls c);

    /** The design (as {@link #design}, with alternatives) and its drawings as SVG text. */
    ObjectNode explore(Controls c);

    /** The cost against depth cap (its SVG plot, the cap marked) and the compare table, as JSON. */
    ObjectNode study(Controls c);

    /** Writes the beam or line as changed to a new YAML file and says where (never over an existing file). */
    String keep(Controls c);
}
