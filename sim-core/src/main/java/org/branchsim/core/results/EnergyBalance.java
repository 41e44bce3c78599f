package org.branchsim.core.results;

import java.util.Map;
import org.branchsim.core.model.EnergyAccount;

/**
 * The run's energy balance, J: supply = losses + work + stored + flow-force work + residual.
 *
 * <p>What the residual proves: that the books are complete. Every element books the power at its ports into
 * accounts, and at every instant those powers add up to zero identically (each flow leaves one node and enters
 * another or a loss; each force's work is booked where it acts); all accounts are integrated by the same
 * quadrature over the same dense output. So the residual closes to round-off by construction, whatever the
 * integration error: a term left out shows at once, an inaccurate trajectory does not. It is not an estimate of
 * the integration error.
 *
 * <p>What can show integration error: the same books kept by another run. {@link #discrepancyFrom} compares each
 * side of this balance with a run of the same circuit at a much tighter tolerance (or with a reference method);
 * the difference falls with the tolerance and grows when steps are too coarse (docs/theory.md section 9). Where
 * the stored energy is a function of the state (fixed volumes with a constant bulk modulus, springs, moving
 * masses), it can also be recomputed from the final state and compared with the stored side of the books.
 *
 * @param accounts energy of every account, J, by account name
 * @param kinds the side of the balance of every account, by account name
 */
public record EnergyBalance(Map<String, Double> accounts, Map<String, EnergyAccount.Kind> kinds) {

    /** @return the total of one side of the balance, J */
    public double total(EnergyAccount.Kind kind) {
        double sum = 0.0;
        for (Map.Entry<String, Double> e : accounts.entrySet()) {
            if (kinds.get(e.getKey()) == kind) {
                sum += e.getValue();
            }
        }
        return sum;
    }

    /** @return supply minus everything it went into, J */
    public double residual() {
        return total(EnergyAccount.Kind.SUPPLY) - total(EnergyAccount.Kind.LOSS) - total(EnergyAccount.Kind.WORK)
                - total(EnergyAccount.Kind.STORED) - total(EnergyAccount.Kind.FLOW_FORCE);
    }

    /**
     * The largest difference between a side of this balance and the same side of a reference run's balance (supply,
     * losses, work, stored, flow-force work), relative to the reference's supplied energy (or, when it supplied
     * nothing, to its largest account). With the reference at a much tighter tolerance this estimates the
     * integration error of the energy figures; unlike the residual, it grows when the steps are too coarse.
     *
     * @param reference the balance of the same circuit and schedule run more accurately
     * @return max over the sides of |this side - reference side| / reference supply (0 when both are empty)
     */
    public double discrepancyFrom(EnergyBalance reference) {
        double scale = Math.abs(reference.total(EnergyAccount.Kind.SUPPLY));
        if (scale == 0.0) {
            scale = reference.accounts().values().stream().mapToDouble(Math::abs).max().orElse(0.0);
        }
        double largest = 0.0;
        for (EnergyAccount.Kind kind : EnergyAccount.Kind.values()) {
            largest = Math.max(largest, Math.abs(total(kind) - reference.total(kind)));
        }
        return largest == 0.0 ? 0.0 : largest / scale;
    }

    /**
     * @return |residual| / |supply|: the completeness of the books (round-off when complete); when nothing was supplied, relative to the largest account instead
     *         (0 only when every account is zero)
     */
    public double relativeResidual() {
        double supply = Math.abs(total(EnergyAccount.Kind.SUPPLY));
        if (supply == 0.0) {
            double largest = accounts.values().stream().mapToDouble(Math::abs).max().orElse(0.0);
            return largest == 0.0 ? 0.0 : Math.abs(residual()) / largest;
        }
        return Math.abs(residual()) / supply;
    }
}
