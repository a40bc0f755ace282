package org.strandbook.app.ui.workbook;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import javafx.scene.control.ComboBox;
import javafx.scene.control.TextField;
import javafx.stage.Window;

import org.strandbook.site.CableSegment;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.Note;
import org.strandbook.site.PathElement;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;

/** The four record dialogs of the history panel: inspection, maintenance action, note, sign-off. */
final class RecordDialogs {

    private RecordDialogs() {
    }

    static RecordDialog<Inspection> inspection(Window owner, PointHistoryViewModel vm) {
        return new RecordDialog<>(owner, "inspection-dialog", "Record an inspection",
                "End-face inspection at " + vm.pointTag() + " (grades after IEC 61300-3-35). Never look into a "
                        + "live fiber: blank the channel first.") {
            private final ComboBox<String> joint = choice("inspection-joint", "Joint", vm.jointLabels());
            private final ComboBox<InspectionGrade> grade = choice("inspection-grade", "Grade",
                    Arrays.stream(InspectionGrade.values()).filter(g -> g != InspectionGrade.NOT_INSPECTED).toList());
            private final TextField by = text("inspection-by", "Inspected by", "name");
            private final TextField at = when("inspection-at");
            private final TextField remark = text("inspection-remark", "What was seen", "optional");
            private final TextField picture = text("inspection-picture", "Picture file", "optional");

            @Override
            Inspection build() {
                return new Inspection(vm.pointTag(), joint.getValue(), time(at), required(by, "who inspected"),
                        grade.getValue(), remark.getText(), picture.getText());
            }

            @Override
            void submit(Inspection record) {
                vm.recordInspection(record);
            }
        };
    }

    static RecordDialog<MaintenanceAction> maintenance(Window owner, PointHistoryViewModel vm) {
        return new RecordDialog<>(owner, "maintenance-dialog", "Record maintenance",
                "Work done at " + vm.pointTag() + ". A replaced segment or probe changes the prediction from its "
                        + "date on; older scans keep the path and probe of their day.") {
            private final ComboBox<MaintenanceKind> kind = choice("maintenance-kind", "Action",
                    List.of(MaintenanceKind.values()));
            private final TextField element = text("maintenance-element", "Joint or cable ID", "J2, C4102-R2");
            private final TextField by = text("maintenance-by", "Done by", "name");
            private final TextField at = when("maintenance-at");
            private final TextField what = text("maintenance-what", "What was done", "optional");
            private final TextField why = text("maintenance-why", "Why", "finding, inspection");
            private final TextField lengthM = text("maintenance-length", "New segment length (m)",
                    "replace segment only");
            private final TextField fiber = text("maintenance-fiber", "New fiber type", "replace segment only");
            private final TextField probe = text("maintenance-probe", "New probe type", "replace probe, if another type");

            @Override
            MaintenanceAction build() {
                MaintenanceKind k = kind.getValue();
                String label = element.getText() == null ? "" : element.getText().strip();
                Optional<PathElement> replacement = Optional.empty();
                if (k == MaintenanceKind.REPLACE_SEGMENT) {
                    String length = required(lengthM, "the new segment's length (m)");
                    String code = fiber.getText() == null || fiber.getText().isBlank()
                            ? vm.cableFiber(label) : fiber.getText().strip();
                    replacement = Optional.of(new CableSegment(label, code, parseMetres(length), List.of()));
                }
                String probeType = probe.getText() == null ? "" : probe.getText().strip();
                if (!probeType.isEmpty() && k != MaintenanceKind.REPLACE_PROBE) {
                    throw new IllegalArgumentException("a new probe type goes with replace probe, not with " + k.words());
                }
                return new MaintenanceAction(vm.pointTag(), k, label, time(at), by.getText(), what.getText(),
                        why.getText(), replacement, probeType);
            }

            @Override
            void submit(MaintenanceAction record) {
                vm.recordMaintenance(record);
            }
        };
    }

    static RecordDialog<Note> note(Window owner, PointHistoryViewModel vm) {
        return new RecordDialog<>(owner, "note-dialog", "Add a note", "A note on " + vm.pointTag()
                + ", or on one joint or cable of it.") {
            private final TextField element = text("note-element", "Joint or cable ID", "optional");
            private final TextField by = text("note-by", "Written by", "name");
            private final TextField at = when("note-at");
            private final TextField body = text("note-text", "Note", "");

            @Override
            Note build() {
                return new Note(vm.pointTag(), element.getText(), time(at), by.getText(),
                        required(body, "the note's text"));
            }

            @Override
            void submit(Note record) {
                vm.recordNote(record);
            }
        };
    }

    static RecordDialog<SignOff> signOff(Window owner, PointHistoryViewModel vm) {
        return new RecordDialog<>(owner, "sign-off-dialog", "Sign the point", "Sign " + vm.pointTag()
                + " as evaluated. The signature keeps a digest of the point's evaluation inputs and shows as "
                + "superseded when they change.") {
            private final ComboBox<SignOffRole> role = choice("sign-off-role", "Role", List.of(SignOffRole.values()));
            private final TextField name = text("sign-off-name", "Name", "");
            private final TextField title = text("sign-off-title", "Job title", "commissioning lead");
            private final TextField at = when("sign-off-at");
            private final TextField comment = text("sign-off-comment", "Comment", "optional");

            @Override
            SignOff build() {
                return new SignOff(role.getValue(), name.getText(), time(at), vm.pointTag(), comment.getText(),
                        title.getText(), "", "");
            }

            @Override
            void submit(SignOff record) {
                vm.recordSignOff(record);
            }
        };
    }

    private static double parseMetres(String text) {
        try {
            return Double.parseDouble(text.replace(',', '.'));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("new segment length '" + text + "' is not a number of metres");
        }
    }

    static String word(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }
}
