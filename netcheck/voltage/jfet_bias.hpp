// Bias of a self-biased common-source N-channel JFET stage (gate at 0 V through its resistor,
// source resistor RS to ground, drain resistor RD to the supply), by Shockley's square law
//     ID = IDSS (1 - VGS / VP)^2,  VGS = -ID RS,  VD = VDD - ID RD.
// For a P-channel stage enter the magnitudes (supply, IDSS, |VP|): the figures are the same
// measured from the supply.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "netcheck/voltage/preferred_values.hpp"

namespace netcheck {

/// The device: IDSS in amperes, VP in volts (negative for N-channel).
struct JfetDevice {
    double idss = 0;
    double vp = 0;
};

/// The stage around it.
struct JfetStage {
    double supply = 0;        ///< VDD, volts
    double drainResistor = 0; ///< RD, ohms
};

/// The stage's DC state with a given source resistor.
struct JfetBias {
    double sourceResistor = 0;  ///< RS, ohms
    double drainCurrent = 0;    ///< ID, amperes
    double gateSource = 0;      ///< VGS, volts
    double source = 0;          ///< VS = ID RS
    double drain = 0;           ///< VD
    double headroomUp = 0;      ///< VDD - VD
    /// VD - (VS + |VP|): the drain's distance above the source-plus-pinch-off limit, a
    /// conservative edge of the saturation region (negative: the stage is out of it).
    double headroomDown = 0;
};

/// The stage's state with source resistor `rs` (>= 0).
JfetBias biasWith(const JfetDevice& device, const JfetStage& stage, double rs);

/// A preferred value next to the exact resistor and the bias it gives.
struct PreferredChoice {
    PreferredSeries series = PreferredSeries::E12;
    bool below = true;  ///< the value below the exact one (else above)
    JfetBias bias;
};

/// The source resistor for a target drain voltage, with the E12 and E24 values either side.
struct SourceResistorAdvice {
    JfetBias exact;
    std::vector<PreferredChoice> preferred;  ///< E12 below, E12 above, E24 below, E24 above
};

struct JfetAdviceResult {
    std::optional<SourceResistorAdvice> advice;
    std::string error;  ///< the target cannot be reached with self-bias, or bad figures
};

/// Exact RS = -VGS / ID for ID = (VDD - VD) / RD and VGS = VP (1 - sqrt(ID / IDSS)).
JfetAdviceResult sourceResistorFor(const JfetDevice& device, const JfetStage& stage,
                                   double targetDrain);

/// A bench measurement: the drain voltage read with a known source resistor fitted.
struct DrainReading {
    double sourceResistor = 0;
    double drain = 0;
};

struct JfetEstimate {
    std::optional<JfetDevice> device;
    std::string error;
};

/// IDSS and VP of the device in hand from two readings with different source resistors: with
/// s = sqrt(IDSS) and t = s / VP, each reading gives sqrt(ID) = s - t VGS: two linear equations.
JfetEstimate estimateJfet(const JfetStage& stage, const DrainReading& first,
                          const DrainReading& second);

}  // namespace netcheck
