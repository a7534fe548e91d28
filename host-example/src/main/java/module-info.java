/** Example flight-software host of the Eigenzeit onboard core: needs nothing beyond java.base. */
module org.eigenzeit.hostexample {
  requires org.eigenzeit.onboard;
}
