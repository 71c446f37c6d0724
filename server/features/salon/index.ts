// The salon feature's public module: other features import it only from here.
export { findSalon, findSalonIdForSignUp, listSalonHours, planningRulesColumns, planningRulesOf, salonCountry, toSalon } from './salon.repository';
