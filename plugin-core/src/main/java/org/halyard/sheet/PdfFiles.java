package org.halyard.sheet;

import java.io.IOException;
import java.nio.file.Path;
import org.apache.pdfbox.pdmodel.PDDocument;

/** Saving PDFs so that the same content gives the same bytes. */
final class PdfFiles {

    private PdfFiles() {
    }

    /**
     * Saves {@code doc} to {@code file} with a file identifier derived from the file name: PDFBox would
     * otherwise derive the trailer's {@code /ID} from the clock, and reruns would differ.
     */
    static void save(PDDocument doc, Path file) throws IOException {
        doc.setDocumentId((long) file.getFileName().toString().hashCode());
        doc.save(file.toFile());
    }
}
