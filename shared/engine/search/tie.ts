/** Two maxima within this relative power of each other are a tie (settled by nearness to the intended beam). */
export const TIE_RATIO = 1e-6;
