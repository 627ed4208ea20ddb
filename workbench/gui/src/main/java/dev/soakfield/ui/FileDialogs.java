package dev.soakfield.ui;

import java.nio.file.Path;
import java.util.Optional;
import org.lwjgl.util.tinyfd.TinyFileDialogs;

/** The platform's file dialogs; a scripted session puts its own answers in their place. */
interface FileDialogs {
  Optional<Path> open();

  Optional<Path> saveAs(Path suggested);

  /** Dialogs of the desktop (tinyfd: GTK/zenity/kdialog on Linux, native ones elsewhere). */
  FileDialogs DESKTOP =
      new FileDialogs() {
        @Override
        public Optional<Path> open() {
          String chosen =
              TinyFileDialogs.tinyfd_openFileDialog(
                  "Open a mesh (.msh), a case (.json) or a result folder's fields.pvd",
                  "",
                  null,
                  null,
                  false);
          return Optional.ofNullable(chosen).map(Path::of);
        }

        @Override
        public Optional<Path> saveAs(Path suggested) {
          String chosen =
              TinyFileDialogs.tinyfd_saveFileDialog(
                  "Save the case as", suggested.toString(), null, null);
          return Optional.ofNullable(chosen).map(Path::of);
        }
      };
}
