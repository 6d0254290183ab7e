package dev.countercheck.report;

import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentCatalog;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.common.PDMetadata;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.apache.xmpbox.XMPMetadata;
import org.apache.xmpbox.schema.AdobePDFSchema;
import org.apache.xmpbox.schema.DublinCoreSchema;
import org.apache.xmpbox.schema.PDFAIdentificationSchema;
import org.apache.xmpbox.schema.XMPBasicSchema;
import org.apache.xmpbox.type.BadFieldValueException;
import org.apache.xmpbox.xml.XmpSerializer;

import javax.xml.transform.TransformerException;
import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Calendar;
import java.util.Map;

/**
 * What makes the PDF an archive copy (PDF/A-3, conformance level U: every font embedded, text
 * mapped to Unicode, an sRGB output intent): the XMP metadata, written from the document
 * information so that the two agree and carry the review date rather than the clock, and the JSON
 * result attached as the data the report presents (PDF/A-3 allows embedded files when the catalogue
 * names them as associated files).
 */
final class PdfArchive {

    static final int PART = 3;
    static final String CONFORMANCE = "U";
    static final String JSON_TYPE = "application/json";

    private PdfArchive() {
    }

    /** The ICC profile of sRGB, the output intent the renderer writes in PDF/A mode (from the Java runtime). */
    static byte[] srgbProfile() {
        return ICC_Profile.getInstance(ColorSpace.CS_sRGB).getData();
    }

    /** Replaces the renderer's XMP metadata (dated by the clock) with one that repeats the document information. */
    static void describe(PDDocument document) throws IOException {
        PDDocumentInformation info = document.getDocumentInformation();
        XMPMetadata xmp = XMPMetadata.createXMPMetadata();
        try {
            PDFAIdentificationSchema id = xmp.createAndAddPDFAIdentificationSchema();
            id.setPart(PART);
            id.setConformance(CONFORMANCE);
        } catch (BadFieldValueException e) {
            throw new IllegalStateException("PDF/A-" + PART + CONFORMANCE + " is a valid identification", e);
        }
        DublinCoreSchema dc = xmp.createAndAddDublinCoreSchema();
        dc.setFormat("application/pdf");
        dc.setTitle(info.getTitle());
        dc.setDescription(info.getSubject());
        AdobePDFSchema pdf = xmp.createAndAddAdobePDFSchema();
        pdf.setProducer(info.getProducer());
        XMPBasicSchema basic = xmp.createAndAddXMPBasicSchema();
        basic.setCreatorTool(info.getCreator());
        basic.setCreateDate(info.getCreationDate());
        basic.setModifyDate(info.getModificationDate());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            new XmpSerializer().serialize(xmp, out, true);
        } catch (TransformerException e) {
            throw new IllegalStateException("could not write the PDF's XMP metadata: " + e.getMessage(), e);
        }
        PDMetadata metadata = new PDMetadata(document);
        metadata.importXMPMetadata(out.toByteArray());
        document.getDocumentCatalog().setMetadata(metadata);
    }

    /**
     * Attaches {@code json} as the file {@code name}, dated {@code date}: listed among the document's
     * embedded files and, for PDF/A-3, among the catalogue's associated files as its data.
     */
    static void attachJson(PDDocument document, String name, String json, Calendar date) throws IOException {
        byte[] bytes = json.getBytes(StandardCharsets.UTF_8);
        PDEmbeddedFile file = new PDEmbeddedFile(document, new ByteArrayInputStream(bytes));
        file.setSubtype(JSON_TYPE);
        file.setSize(bytes.length);
        file.setCreationDate(date);
        file.setModDate(date);
        PDComplexFileSpecification spec = new PDComplexFileSpecification();
        spec.setFile(name);
        spec.setFileUnicode(name);
        spec.setEmbeddedFile(file);
        spec.setEmbeddedFileUnicode(file);
        spec.setFileDescription("The review's result as JSON: the data this report presents");
        spec.getCOSObject().setName(COSName.getPDFName("AFRelationship"), "Data");
        PDEmbeddedFilesNameTreeNode files = new PDEmbeddedFilesNameTreeNode();
        files.setNames(Map.of(name, spec));
        PDDocumentCatalog catalog = document.getDocumentCatalog();
        PDDocumentNameDictionary names = new PDDocumentNameDictionary(catalog);
        names.setEmbeddedFiles(files);
        catalog.setNames(names);
        COSArray associated = new COSArray();
        associated.add(spec);
        catalog.getCOSObject().setItem(COSName.getPDFName("AF"), associated);
    }
}
