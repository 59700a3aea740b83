package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.inkgate.packs.policy.PastePolicy;
import org.junit.jupiter.api.Test;

/** The paste rule of docs/resource-packs.md's policy: external clipboard content is never pasted. */
class PasteGateTest {

    @Test
    void decide_withinResponse_pastesOnlyTheTextCopiedHere() {
        PasteGate gate = new PasteGate(PastePolicy.WITHIN_RESPONSE);
        assertEquals(new PasteGate.Refuse(PasteGate.OUTSIDE, 5), gate.decide("hello"), "nothing copied here yet");
        gate.copied("hello");
        assertEquals(new PasteGate.Insert("hello"), gate.decide("hello"));
        assertEquals(new PasteGate.Refuse(PasteGate.OUTSIDE, 6), gate.decide("hello!"), "changed by another program");
        assertEquals(new PasteGate.Refuse(PasteGate.OUTSIDE, 0), gate.decide(null));
    }

    @Test
    void decide_none_refusesEverything() {
        PasteGate gate = new PasteGate(PastePolicy.NONE);
        gate.copied("hello");
        assertFalse(gate.copyAllowed());
        assertEquals(new PasteGate.Refuse(PasteGate.FORBIDDEN, 5), gate.decide("hello"));
        assertEquals(new PasteGate.Refuse(PasteGate.FORBIDDEN, 0), gate.decide(null));
    }
}
