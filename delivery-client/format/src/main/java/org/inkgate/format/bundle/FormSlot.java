package org.inkgate.format.bundle;

import org.inkgate.packs.policy.ResourcePolicy;

/**
 * One task of a form, with the condition it is sat under and the resource policy that follows.
 * The policy is written out in full (not looked up from the condition) so that the signed
 * manifest states exactly which tools each task of each form offers.
 */
public record FormSlot(String taskId, String conditionId, ResourcePolicy policy) {
}
