package org.swingclearance.training.web;

import jakarta.validation.constraints.AssertTrue;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

/**
 * The pain rating the morning after a session (0–10 numeric rating scale). {@code version} is the entry the
 * person saw (0 when there was none); replacing an earlier rating needs a reason.
 */
public class MorningPainForm {

    @NotNull
    @Min(0)
    @Max(10)
    private Integer pain;
    @NotNull
    @Min(0)
    private Integer version = 0;
    @Size(max = 1000)
    private String reason;

    @AssertTrue
    public boolean isReasonGivenWhenCorrecting() {
        return version == null || version == 0 || (reason != null && !reason.isBlank());
    }

    public Integer getPain() { return pain; }
    public void setPain(Integer pain) { this.pain = pain; }
    public Integer getVersion() { return version; }
    public void setVersion(Integer version) { this.version = version; }
    public String getReason() { return reason; }
    public void setReason(String reason) { this.reason = reason; }
}
