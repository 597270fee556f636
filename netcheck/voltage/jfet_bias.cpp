#include "netcheck/voltage/jfet_bias.hpp"

#include <algorithm>
#include <cmath>

namespace netcheck {

namespace {

bool positive(double value) {
    return std::isfinite(value) && value > 0;
}

}  // namespace

JfetBias biasWith(const JfetDevice& device, const JfetStage& stage, double rs) {
    // ID = IDSS (1 + ID RS / VP)^2; with a = RS / VP (negative):
    //   IDSS a^2 ID^2 + (2 IDSS a - 1) ID + IDSS = 0,
    // and the root that keeps VGS above VP (1 + a ID >= 0) is the smaller one.
    double id = device.idss;
    if (rs > 0) {
        const double a = rs / device.vp;
        const double qa = device.idss * a * a;
        const double qb = 2 * device.idss * a - 1;
        const double discriminant = std::max(0.0, qb * qb - 4 * qa * device.idss);
        // The smaller root written without cancellation: 2c / (-b + sqrt(D)).
        id = 2 * device.idss / (-qb + std::sqrt(discriminant));
    }
    JfetBias bias;
    bias.sourceResistor = rs;
    bias.drainCurrent = id;
    bias.gateSource = -id * rs;
    bias.source = id * rs;
    bias.drain = stage.supply - id * stage.drainResistor;
    bias.headroomUp = stage.supply - bias.drain;
    bias.headroomDown = bias.drain - (bias.source + std::abs(device.vp));
    return bias;
}

JfetAdviceResult sourceResistorFor(const JfetDevice& device, const JfetStage& stage,
                                   double targetDrain) {
    if (!positive(device.idss) || !(device.vp < 0) || !std::isfinite(device.vp)) {
        return {std::nullopt, "IDSS must be above 0 and VP below 0 (N-channel)"};
    }
    if (!positive(stage.supply) || !positive(stage.drainResistor)) {
        return {std::nullopt, "the supply and the drain resistor must be above 0"};
    }
    if (!(targetDrain > 0 && targetDrain < stage.supply)) {
        return {std::nullopt, "the target drain voltage must lie between 0 V and the supply"};
    }
    const double id = (stage.supply - targetDrain) / stage.drainResistor;
    if (id >= device.idss) {
        return {std::nullopt,
                "the target needs at least IDSS through the drain resistor: no source resistor "
                "reaches it (raise the target or the drain resistor)"};
    }
    const double vgs = device.vp * (1 - std::sqrt(id / device.idss));
    SourceResistorAdvice advice;
    advice.exact = biasWith(device, stage, -vgs / id);
    for (const PreferredSeries series : {PreferredSeries::E12, PreferredSeries::E24}) {
        const auto neighbours = preferredNeighbours(advice.exact.sourceResistor, series);
        if (!neighbours) continue;
        advice.preferred.push_back({series, true, biasWith(device, stage, neighbours->below)});
        advice.preferred.push_back({series, false, biasWith(device, stage, neighbours->above)});
    }
    return {advice, {}};
}

JfetEstimate estimateJfet(const JfetStage& stage, const DrainReading& first,
                          const DrainReading& second) {
    if (!positive(stage.supply) || !positive(stage.drainResistor)) {
        return {std::nullopt, "the supply and the drain resistor must be above 0"};
    }
    const double id1 = (stage.supply - first.drain) / stage.drainResistor;
    const double id2 = (stage.supply - second.drain) / stage.drainResistor;
    if (!positive(id1) || !positive(id2)) {
        return {std::nullopt, "each drain reading must be below the supply (current must flow)"};
    }
    const double vgs1 = -id1 * first.sourceResistor;
    const double vgs2 = -id2 * second.sourceResistor;
    if (std::abs(vgs1 - vgs2) < 1e-6) {
        return {std::nullopt,
                "the two readings give the same gate-source voltage: measure with two clearly "
                "different source resistors"};
    }
    const double t = (std::sqrt(id1) - std::sqrt(id2)) / (vgs2 - vgs1);
    const double s = std::sqrt(id1) + t * vgs1;
    if (!(s > 0) || !(t < 0)) {
        return {std::nullopt,
                "the readings do not fit the square law (the current should fall as the source "
                "resistor grows): check the readings and the stage"};
    }
    return {JfetDevice{s * s, s / t}, {}};
}

}  // namespace netcheck
