package org.inkgate.admin.core.qti;

/** Namespaces and fixed names of the QTI documents Inkgate writes and reads. */
public final class QtiNames {

    /** QTI 3.0 Assessment, Section and Item. */
    public static final String ASI = "http://www.imsglobal.org/xsd/imsqtiasi_v3p0";
    /** QTI 2.2 items (read only). */
    public static final String QTI22 = "http://www.imsglobal.org/xsd/imsqti_v2p2";
    /** QTI 3.0 content package manifest (the IMS CP 1.2 profile; the namespace keeps "v1p1"). */
    public static final String MANIFEST = "http://www.imsglobal.org/xsd/qti/qtiv3p0/imscp_v1p1";
    /** QTI 2.x content package manifest (IMS CP 1.1), read only. */
    public static final String MANIFEST_CP11 = "http://www.imsglobal.org/xsd/imscp_v1p1";
    /** Access for All 3.0 Personal Needs and Preferences, QTI 3.0 profile. */
    public static final String PNP = "http://www.imsglobal.org/xsd/qti/qtiv3p0/imsafa3p0pnp_v1p0";
    /** Inkgate's own extension elements (schema: inkgate-qti-extension.xsd beside this class). */
    public static final String INKGATE = "urn:inkgate:qti-extension:1";
    /** The schema of {@link #INKGATE}, as a class-path resource. */
    public static final String INKGATE_SCHEMA = "/org/inkgate/admin/core/qti/inkgate-qti-extension.xsd";

    public static final String MANIFEST_FILE = "imsmanifest.xml";
    public static final String TEST_FILE = "assessment-test.xml";
    /** Exam settings QTI has no place for (conditions, design, questionnaires, packs), in exam.yaml's own syntax. */
    public static final String SETTINGS_FILE = "inkgate/exam-settings.yaml";
    public static final String SETTINGS_FOLDER = "inkgate/";

    private QtiNames() {
    }
}
