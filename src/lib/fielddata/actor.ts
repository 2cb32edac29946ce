/** Who is acting, as the field-data services need it (the session user carries more). */
export interface Actor {
  email: string;
  name: string;
  role: string;
}
