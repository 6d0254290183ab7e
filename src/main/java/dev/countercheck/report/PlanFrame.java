package dev.countercheck.report;

import dev.countercheck.submission.PileCap;

/**
 * Where a cap's plan lies on its canvas: canvas units per mm and the canvas point of the plan's
 * origin (the cap centre). y points up on the plan and down on the canvas.
 */
record PlanFrame(PileCap cap, double scale, double centreX, double centreY) {

    /** Canvas x of a plan x, mm. */
    double x(double mm) {
        return centreX + mm * scale;
    }

    /** Canvas y of a plan y, mm. */
    double y(double mm) {
        return centreY - mm * scale;
    }

    double left() {
        return x(-cap.planXMm() / 2);
    }

    double right() {
        return x(cap.planXMm() / 2);
    }

    double top() {
        return y(cap.planYMm() / 2);
    }

    double bottom() {
        return y(-cap.planYMm() / 2);
    }

    /** A pile's radius on the canvas. */
    double pileRadius() {
        return cap.piles().diameterMm() / 2 * scale;
    }
}
