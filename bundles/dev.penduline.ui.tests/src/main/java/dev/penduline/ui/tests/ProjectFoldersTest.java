package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.ui.ProjectFolders;

/** A mechanism folder kept in version control opens as a project in place, untouched. */
class ProjectFoldersTest {

    @TempDir
    Path dir;

    @Test
    void aFolderOpensInPlaceOnceAndItsFilesAreLeftAsTheyAre() throws Exception {
        Path folder = Files.createDirectories(dir.resolve("gate-arm"));
        byte[] content = "name,shape,mass_kg,x_m,y_m,z_m\nbob,point,1,0,-1,0\n".getBytes();
        Files.write(folder.resolve("parts.csv"), content);
        IProject project = ProjectFolders.open(folder, new NullProgressMonitor());
        assertTrue(project.isOpen());
        assertEquals(IPath.fromOSString(folder.toString()), project.getLocation());
        IFile parts = project.getFile("parts.csv");
        assertTrue(parts.exists(), "the folder's files are in the project");
        assertEquals(project, ProjectFolders.open(folder, new NullProgressMonitor()), "opened once");
        project.delete(false, true, new NullProgressMonitor());
        assertArrayEquals(content, Files.readAllBytes(folder.resolve("parts.csv")), "files stay where they were");
    }

    @Test
    void aFolderOpensOnItsMechanismFile() throws Exception {
        Path folder = Files.createDirectories(dir.resolve("hatch").resolve("records"));
        Files.writeString(folder.resolve("old.penduline"), "<mechanism/>\n");
        Files.writeString(folder.getParent().resolve("parts.csv"), "name,shape,mass_kg,x_m,y_m,z_m\n");
        Files.writeString(folder.getParent().resolve("hatch.penduline"), "<mechanism/>\n");
        IProject project = ProjectFolders.open(folder.getParent(), new NullProgressMonitor());
        try {
            assertEquals("hatch.penduline", ProjectFolders.firstMechanismFile(project).orElseThrow().getName(),
                    "the top-level mechanism file comes before one in a folder");
        } finally {
            project.delete(false, true, new NullProgressMonitor());
        }
    }
}
