/** Every final-check item ticked: a passed hand-over check (items as the final-check request names them). */
export const ALL_PASS = {
  brakes: true,
  shifting: true,
  steering: true,
  fasteners_torqued: true,
  wheels_true_centred: true,
  tyres_pressure: true,
  axles_closed: true,
  test_ride: true,
};
