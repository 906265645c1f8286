package org.mobident.mobility;

import org.mobident.result.MobilityScale;

/**
 * A marker scheme that is a special case of a more general one (a neutral marker is a charged
 * marker of mobility 0): every conversion is delegated to the general form, so each formula
 * exists once.
 */
interface SpecialCaseScale extends MobilityScale {

    /** The general scheme this one is a special case of. */
    MobilityScale general();

    @Override
    default double mobility(double timeS) {
        return general().mobility(timeS);
    }

    @Override
    default double mobilitySd(double timeS, double timeSdS) {
        return general().mobilitySd(timeS, timeSdS);
    }

    @Override
    default double timeS(double mobility) {
        return general().timeS(mobility);
    }

    @Override
    default double eofMobility() {
        return general().eofMobility();
    }
}
