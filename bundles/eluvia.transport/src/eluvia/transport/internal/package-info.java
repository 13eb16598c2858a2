/**
 * Implementation of the transport solutions (not API): the finite-layer series and image forms,
 * the two-region Laplace-domain solution, the de Hoog-Knight-Stokes inversion, scaled error
 * functions and the profile-maximum search. Exported only to the test fragment.
 */
package eluvia.transport.internal;
