/**
 * The note shown in the main area after the scenario panel moved the wavelength to follow a newly
 * chosen chip (so the user sees it where they are looking, and can undo it), and the offers the user
 * declined. Shared by the panel, which sets it, and the notice, which shows it.
 */
export interface WavelengthMove {
  chip: string;
  fromNm: number;
  toNm: number;
  rangeText: string;
}

class EmissionNotice {
  moved: WavelengthMove | null = $state(null);
  /** "chip@nm" pairs the user chose to keep; their offer is not shown again this session. */
  kept: string[] = $state([]);

  keep(chip: string, nm: number): void {
    this.kept = [...this.kept, `${chip}@${nm}`];
  }
  isKept(chip: string, nm: number): boolean {
    return this.kept.includes(`${chip}@${nm}`);
  }
}

export const emissionNotice = new EmissionNotice();
