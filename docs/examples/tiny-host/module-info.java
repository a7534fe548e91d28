module org.example.host {
  requires org.eigenzeit.onboard;
}
