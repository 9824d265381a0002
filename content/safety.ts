/** The cautions shown wherever a choice of tire or size is made. Plain words, our own. */
export const safetySummary =
  "Tires carry people. Follow your vehicle's tire and loading placard, fit a tire only to a wheel of exactly its rim size, never fit a lower load index or speed rating than specified, and have tires mounted and balanced by a qualified fitter. Local rules and the vehicle and tire makers' guidance come first.";

export const safetyCautions = [
  "Follow the tire and loading information placard on your vehicle (usually on the driver's door jamb).",
  "Never fit a lower load index or a lower speed rating than the vehicle specifies.",
  "Keep the same rim diameter: a tire only fits a wheel of exactly its rim size. 16- and 16.5-inch tires and wheels (likewise 15 and 15.5, 17 and 17.5) never interchange: a bead seated on the wrong rim can burst.",
  "A change of overall diameter changes what the speedometer shows and can affect ABS, stability control and clearance.",
  "Have tires mounted and balanced by a qualified fitter.",
  "Local rules and the vehicle and tire makers' guidance prevail over anything shown here.",
] as const;

/**
 * The cautions of the pages about changing size (Side-by-side, the Plus planner): "keep the same rim
 * diameter" becomes what a new wheel and the tire on it must still meet.
 */
export const sizeChangeCautions = [
  "Follow the tire and loading information placard on your vehicle (usually on the driver's door jamb): the new tire's load index and speed symbol must still be at least what it specifies.",
  "A new wheel must be approved for the vehicle: bolt pattern, centre bore, offset and the wheel's own load rating. The TPMS sensors must suit the new wheels, or be moved over and checked.",
  "A new tire fits only a wheel of exactly its rim size. 16- and 16.5-inch tires and wheels (likewise 15 and 15.5, 17 and 17.5) never interchange: when buying a new wheel, match its diameter to the tire exactly, since a bead seated on the wrong rim can burst.",
  "Check clearance to brakes, suspension and bodywork at full steering lock and full compression.",
  "A change of overall diameter changes what the speedometer shows and can affect ABS, stability control and clearance.",
  "The theoretical rim width is a guide; the tire maker's approved rim widths decide.",
  "Have wheels and tires mounted, balanced and torqued by a qualified fitter.",
  "Local rules (some require a wheel or size change to be approved or recorded) and the vehicle and tire makers' guidance prevail over anything shown here.",
] as const;

/** Shown beside a tire that does not meet every rule of equal-or-better for the tire on the car. */
export const notEqualOrBetterCaution =
  "Check your vehicle's tire placard and ask a qualified fitter before choosing this tire: it does not meet every rule for the tire on your car.";

/** The cautions of Wear match: replacing one or two tires on an all-wheel-drive vehicle. */
export const wearMatchCautions = [
  "Follow the vehicle maker's limit on tread depth or rolling circumference, in the owner's handbook; the shop's default applies only where the maker states none.",
  "Have a qualified fitter measure every tire with a gauge, in several grooves, and take the lowest reading; any shaving is done by the fitter on a tire lathe.",
  "A new tire must match the size, load index and speed symbol on the vehicle's tire and loading placard (usually on the driver's door jamb).",
  "Two new tires go on the rear axle (common practice); the fitter may advise otherwise for your vehicle.",
  "Different sizes front and rear (a staggered fitment) are not covered here: ask the shop.",
  "Local rules and the vehicle and tire makers' guidance prevail over anything shown here.",
] as const;
