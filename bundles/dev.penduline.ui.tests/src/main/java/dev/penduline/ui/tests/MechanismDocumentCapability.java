package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.emf.edit.command.SetCommand;

import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.PendulinePackage;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismStore;
import dev.penduline.ui.internal.document.MechanismDocument;

/**
 * The shared mechanism document in the live workbench: a change is one undoable command (dirty,
 * undo, redo), a save reaches the file, a save over a file another writer changed is refused
 * and keeps that writer's change, and a revert reads it back.
 */
final class MechanismDocumentCapability implements Capability {


    @Override
    public void run(WorkbenchDriver driver) throws Exception {
        Path scratch = Files.createTempDirectory("penduline-document-test");
        IFile file = TestMechanisms.rodAndDisc(scratch, "document-arm", "Document arm (invented)");
        MechanismDocument doc = MechanismDocument.read(file);
        List<String> heard = new ArrayList<>();
        doc.addListener(() -> heard.add("change"));
        assertFalse(doc.isDirty(), "a document just read is clean");
        Part arm = doc.mechanism().getParts().get(0);
        assertEquals(2.0, arm.getMass(), "arm mass as read");

        assertTrue(doc.execute(SetCommand.create(doc.domain(), arm, PendulinePackage.Literals.PART__MASS, 4.0)));
        assertEquals(4.0, arm.getMass(), "after the change");
        assertTrue(doc.isDirty(), "a change makes the document dirty");
        assertFalse(heard.isEmpty(), "listeners hear the change");
        doc.commandStack().undo();
        assertEquals(2.0, arm.getMass(), "after undo");
        assertFalse(doc.isDirty(), "undo back to the saved state is clean");
        doc.commandStack().redo();
        assertEquals(4.0, arm.getMass(), "after redo");

        doc.save(false, note -> { });
        assertFalse(doc.isDirty(), "clean after save");
        assertEquals(4.0, MechanismLoader.readMechanism(doc.path()).getParts().get(0).getMass(), "mass in the file");

        // Another writer (the command line, say) changes the file meanwhile.
        MechanismStore.update(doc.path(), m -> {
            m.setDescription("changed by another writer");
            return null;
        }, note -> { });
        assertTrue(doc.changedOnDisk(), "the other writer's change is noticed");
        doc.execute(SetCommand.create(doc.domain(), arm, PendulinePackage.Literals.PART__MASS, 5.0));
        InputException refused = assertThrows(InputException.class, () -> doc.save(false, note -> { }));
        assertTrue(refused.getMessage().contains("changed on disk"), refused.getMessage());
        Mechanism onDisk = MechanismLoader.readMechanism(doc.path());
        assertEquals("changed by another writer", onDisk.getDescription(), "the refused save wrote nothing");
        assertEquals(4.0, onDisk.getParts().get(0).getMass(), "the refused save wrote nothing");

        doc.reload();
        assertFalse(doc.isDirty(), "clean after revert");
        assertFalse(doc.commandStack().canUndo(), "revert drops the undo history");
        assertEquals("changed by another writer", doc.mechanism().getDescription(), "revert reads the new content");
        assertEquals(4.0, doc.mechanism().getParts().get(0).getMass(), "revert reads the new content");
    }
}
