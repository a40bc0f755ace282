package org.strandbook.uncertainty;

import java.util.Objects;

/** The allowances of one element of a light path, in the form its kind needs. */
public sealed interface ElementAllowances {

    /** A fiber run: its length, attenuation, OH content and (if bent) bend radius. */
    record Fiber(Allowance length, Allowance attenuation, Allowance ohContent, Allowance bendRadius)
            implements ElementAllowances {
        public Fiber {
            Objects.requireNonNull(length, "length");
            Objects.requireNonNull(attenuation, "attenuation");
            Objects.requireNonNull(ohContent, "ohContent");
            Objects.requireNonNull(bendRadius, "bendRadius");
        }
    }

    /** A lumped loss in dB: a joint's loss or a probe's fixed loss. */
    record Lumped(Allowance loss) implements ElementAllowances {
        public Lumped {
            Objects.requireNonNull(loss, "loss");
        }
    }

    /** An element whose loss the budget takes as exact (a Fresnel face of known index). */
    record Exact() implements ElementAllowances {
    }
}
