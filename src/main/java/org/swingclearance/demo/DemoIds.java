package org.swingclearance.demo;

import java.util.UUID;

/** Fixed ids of the demo records, so seeding is idempotent and features can add to the same demo patients. */
public final class DemoIds {

    public static final UUID CLINIC = UUID.fromString("00000000-0000-4000-8000-000000000001");
    public static final UUID OTHER_CLINIC = UUID.fromString("00000000-0000-4000-8000-000000000002");
    public static final UUID CLINICIAN = UUID.fromString("00000000-0000-4000-8000-000000000101");
    public static final UUID TRAINER = UUID.fromString("00000000-0000-4000-8000-000000000102");
    public static final UUID SECOND_TRAINER = UUID.fromString("00000000-0000-4000-8000-000000000103");
    public static final UUID MANAGER = UUID.fromString("00000000-0000-4000-8000-000000000104");
    public static final UUID ADMIN = UUID.fromString("00000000-0000-4000-8000-000000000105");
    public static final UUID OTHER_CLINICIAN = UUID.fromString("00000000-0000-4000-8000-000000000201");
    public static final UUID PATIENT_SHOULDER = UUID.fromString("00000000-0000-4000-8000-000000001001");
    public static final UUID PATIENT_BACK = UUID.fromString("00000000-0000-4000-8000-000000001002");
    public static final UUID PATIENT_BOTH = UUID.fromString("00000000-0000-4000-8000-000000001003");
    public static final UUID PATIENT_HOLD = UUID.fromString("00000000-0000-4000-8000-000000001004");
    public static final UUID OTHER_PATIENT = UUID.fromString("00000000-0000-4000-8000-000000002001");
    public static final UUID EPISODE_SHOULDER = UUID.fromString("00000000-0000-4000-8000-000000011001");
    public static final UUID EPISODE_BACK = UUID.fromString("00000000-0000-4000-8000-000000011002");
    public static final UUID EPISODE_BOTH = UUID.fromString("00000000-0000-4000-8000-000000011003");
    public static final UUID EPISODE_HOLD = UUID.fromString("00000000-0000-4000-8000-000000011004");
    public static final UUID OTHER_EPISODE = UUID.fromString("00000000-0000-4000-8000-000000021001");

    /** Order of the demo seeders: clinics and patients first, then each feature's records. */
    public static final int ORDER_CLINICS = 0;

    private DemoIds() {
    }
}
