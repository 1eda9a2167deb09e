/**
 * Maximum luminous efficacy of photopic radiation, Km = 683 lm/W (at 555 nm, 540 THz; the SI
 * definition of the candela fixes Kcd = 683 lm/W at 540×10¹² Hz).
 * @see BIPM, The International System of Units (SI brochure), 9th ed. (2019), §2.3.1; CIE 015:2018
 */
export const KM_LM_PER_W = 683;
