package org.branchsim.core.results;

import java.util.Map;
import org.branchsim.core.model.EnergyAccount;

/**
 * The run's energy balance, J: supply = losses + work + stored + flow-force work + residual. The residual
 * measures the integration error of the run (and is reported relative to the supply).
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
     * @return |residual| / |supply|; when nothing was supplied, relative to the largest account instead
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
