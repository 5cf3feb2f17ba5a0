package org.swingclearance.audit;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.boot.SpringApplication;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.stereotype.Component;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * The command-line verification: {@code java -jar swing-clearance.jar verify-audit [clinicId]} walks one chain
 * (or every chain), prints a report per chain, records the run in each chain it verified, and exits with 0 when
 * all are intact, 1 when a chain is broken, 2 on a bad argument. Without the argument it does nothing, so the
 * web application starts as usual. {@link VerifyAuditMode} keeps this run off the usual port and off the network.
 */
@Component
class VerifyAuditCommand implements ApplicationRunner {

    static final String COMMAND = "verify-audit";

    private final AuditVerifier verifier;
    private final AuditLog audit;
    private final ConfigurableApplicationContext context;
    private final TransactionTemplate tx;

    VerifyAuditCommand(AuditVerifier verifier, AuditLog audit, ConfigurableApplicationContext context,
                       PlatformTransactionManager transactions) {
        this.verifier = verifier;
        this.audit = audit;
        this.context = context;
        this.tx = new TransactionTemplate(transactions);
    }

    @Override
    public void run(ApplicationArguments args) {
        List<String> words = args.getNonOptionArgs();
        if (!words.contains(COMMAND)) {
            return;
        }
        int code = execute(words.subList(words.indexOf(COMMAND) + 1, words.size()), System.out);
        System.exit(SpringApplication.exit(context, () -> code));
    }

    /** Verifies the chains the arguments name and prints the reports; returns the process exit code. */
    int execute(List<String> arguments, PrintStream out) {
        List<UUID> chains = new ArrayList<>();
        if (arguments.isEmpty()) {
            chains.addAll(verifier.chains());
        } else {
            for (String argument : arguments) {
                try {
                    chains.add(UUID.fromString(argument));
                } catch (IllegalArgumentException e) {
                    out.println("not a clinic id: " + argument);
                    out.println("usage: java -jar swing-clearance.jar " + COMMAND + " [clinicId ...]");
                    return 2;
                }
            }
        }
        boolean allIntact = true;
        for (UUID chainId : chains) {
            VerificationReport report = verifier.verify(chainId);
            out.print(report.describe());
            allIntact &= report.intact();
            tx.executeWithoutResult(s -> audit.recordAnonymous(
                    AuditLog.SYSTEM_CHAIN.equals(chainId) ? null : chainId, "command line", AuditActions.AUDIT_VERIFY,
                    AuditOutcome.SUCCESS, null, VerificationSummary.detailOf(report)));
        }
        out.println(chains.isEmpty() ? "no audit chains yet" : allIntact ? "ALL INTACT" : "BROKEN CHAIN FOUND");
        return allIntact ? 0 : 1;
    }
}
