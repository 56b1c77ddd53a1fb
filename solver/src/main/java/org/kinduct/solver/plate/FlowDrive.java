package org.kinduct.solver.plate;

import org.kinduct.solver.sheet.ChannelFlow;
import org.kinduct.solver.sheet.SheetDrive;

/**
 * The part of a channel's drive its flow makes: the field of the whole drive, the liquid's
 * velocity relative to the walls, no induced field. Its EMFs' power on the currents is what the
 * pump supplies against the field's force on the moving liquid.
 */
record FlowDrive(FrameDrive whole, ChannelFlow flow) implements SheetDrive {

    @Override
    public double bzT(double x, double y) {
        return whole.bzT(x, y);
    }

    @Override
    public double bzAlongT(double ax, double ay, double bx, double by) {
        return whole.bzAlongT(ax, ay, bx, by);
    }

    @Override
    public void velocity(double x, double y, double[] out) {
        flow.velocity(x, y, out);
    }

    @Override
    public double flowAcrossM2PerS(double ax, double ay, double bx, double by) {
        return flow.flowAcrossM2PerS(ax, ay, bx, by);
    }
}
