package org.swingclearance.audit.web;

import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;

/**
 * The clinic's retention period in whole years. At least 6: HIPAA 45 CFR 164.316(b)(2)(i) keeps security
 * documentation, which includes audit records, for six years; at most 100, the database's own limit.
 */
public class RetentionForm {

    @NotNull
    @Min(6)
    @Max(100)
    private Integer years;
    private long version;

    public Integer getYears() { return years; }
    public void setYears(Integer years) { this.years = years; }
    public long getVersion() { return version; }
    public void setVersion(long version) { this.version = version; }
}
