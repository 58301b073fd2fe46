export * from "./units";
export * from "./ventilation";
export * from "./removal";
export * from "./co2";
export * from "./co2-daily";
export * from "./room-figures";
